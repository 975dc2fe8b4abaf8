import { isDeepStrictEqual } from "node:util";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkConfiguration, ConfigurationError, type ConfigurationProblem } from "./check";
import { computeSpectrum } from "./spectrum";
import type { Configuration, SpectrumResult, Stack, Theory } from "./types";

// Fuzzing of the engine's invalid-input policy (check.ts, module doc): `checkConfiguration` never
// throws for a value shaped like a Configuration, however wrong its values (NaN, infinities,
// fractions, out-of-range axes, odd position keys), and `computeSpectrum` either returns a
// result or throws the documented ConfigurationError carrying the same problems.

/** Runs of the main property; `FUZZ_RUNS` raises it for `npm run fuzz:long`. */
const runs = Math.max(10_000, Number(process.env.FUZZ_RUNS ?? 0) || 0);
const seed = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : undefined;

/** Numbers that break naive code: NaN, infinities, -0, fractions, huge and tiny values. */
const nastyNumber = fc.constantFrom(
  Number.NaN,
  Number.POSITIVE_INFINITY,
  Number.NEGATIVE_INFINITY,
  -0,
  0.5,
  -1,
  1e9,
  -1e9,
  Number.MAX_SAFE_INTEGER + 2,
  Number.MIN_VALUE,
  Number.MAX_VALUE,
);

/** Mostly `sane`, sometimes a nasty number or an arbitrary double. */
function sometimesNasty(sane: fc.Arbitrary<number>): fc.Arbitrary<number> {
  return fc.oneof({ weight: 8, arbitrary: sane }, { weight: 1, arbitrary: nastyNumber }, { weight: 1, arbitrary: fc.double() });
}

const stackId = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom("a", "b", "c", "d", "probe", "wall", "s-1", "s_2") },
  { weight: 1, arbitrary: fc.string({ maxLength: 8 }) },
  { weight: 1, arbitrary: fc.constantFrom("", " ", "a b", "x".repeat(65), "__proto__", "constructor", "é", "a\u0000") },
);

const positionKey = fc.oneof(
  { weight: 8, arbitrary: fc.integer({ min: 1, max: 25 }).map(String) },
  { weight: 1, arbitrary: fc.constantFrom("0", "-1", "1.5", "01", "26", "abc", "", "__proto__", "constructor", "9 ", "1e1") },
  { weight: 1, arbitrary: fc.string({ maxLength: 4 }) },
);

/** Built with Object.fromEntries so that a "__proto__" key becomes an own property, as JSON.parse makes it. */
const position = fc
  .array(fc.tuple(positionKey, sometimesNasty(fc.double({ min: -10, max: 10, noNaN: true }))), { maxLength: 6 })
  .map((entries): Record<string, number> => Object.fromEntries(entries));

/** Any worldvolume: sorted unique axes of the chosen range, or an unsorted, duplicated, out-of-range list. */
const worldvolume = (maxAxis: number) =>
  fc.oneof(
    { weight: 6, arbitrary: fc.uniqueArray(fc.integer({ min: 1, max: maxAxis }), { maxLength: maxAxis }).map((axes) => axes.sort((x, y) => x - y)) },
    { weight: 1, arbitrary: fc.array(fc.integer({ min: 1, max: maxAxis }), { maxLength: 10 }) },
    { weight: 1, arbitrary: fc.array(sometimesNasty(fc.integer({ min: -2, max: 30 })), { maxLength: 6 }) },
  );

const anyStack = (maxAxis: number): fc.Arbitrary<Stack> =>
  fc.record({
    id: stackId,
    label: fc.string({ maxLength: 12 }),
    count: sometimesNasty(fc.integer({ min: 1, max: 5 })),
    anti: fc.boolean(),
    worldvolume: worldvolume(maxAxis),
    position,
  });

/** A type II stack with the right parity of p and positions only on Dirichlet axes: usually valid. */
const typeTwoStack = (theory: "IIA" | "IIB", id: string): fc.Arbitrary<Stack> =>
  fc
    .record({
      neumann: fc.array(fc.boolean(), { minLength: 9, maxLength: 9 }),
      positions: fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 9, maxLength: 9 }),
      count: fc.integer({ min: 1, max: 4 }),
      anti: fc.boolean(),
    })
    .map(({ neumann, positions, count, anti }) => {
      const flags = [...neumann];
      if ((flags.filter(Boolean).length % 2 === 0) !== (theory === "IIA")) flags[8] = !flags[8];
      const axes = [1, 2, 3, 4, 5, 6, 7, 8, 9];
      const place: Record<string, number> = {};
      axes.forEach((axis, index) => {
        if (!flags[index]) place[String(axis)] = positions[index] ?? 0;
      });
      return { id, label: "", count, anti, worldvolume: axes.filter((_, index) => flags[index]), position: place };
    });

const levels = fc.oneof(
  { weight: 9, arbitrary: fc.integer({ min: 0, max: 6 }) },
  { weight: 1, arbitrary: fc.constantFrom(-1, 2.5, 201, 1e9, Number.NaN, Number.POSITIVE_INFINITY) },
);
const stringScale = fc.oneof(fc.constant(null), sometimesNasty(fc.double({ min: 1, max: 1e19, noNaN: true })));
const dimension = fc.oneof(
  { weight: 6, arbitrary: fc.constant(undefined) },
  { weight: 3, arbitrary: fc.integer({ min: 0, max: 30 }) },
  { weight: 1, arbitrary: nastyNumber },
);

/** Malformed in every field at once, drawn independently. */
const wildConfiguration: fc.Arbitrary<Configuration> = fc
  .record({
    theory: fc.constantFrom<Theory>("bosonic", "IIA", "IIB"),
    dimension,
    stringScaleGeV: stringScale,
    levels,
    title: fc.string({ maxLength: 10 }),
    stackCount: fc.integer({ min: 0, max: 6 }),
  })
  .chain(({ theory, dimension: d, stringScaleGeV, levels: n, title, stackCount }) =>
    fc.array(anyStack(theory === "bosonic" ? 27 : 10), { minLength: stackCount, maxLength: stackCount }).map(
      (stacks): Configuration => ({
        format: 1,
        title,
        theory,
        ...(d === undefined ? {} : { dimension: d }),
        stringScaleGeV,
        levels: n,
        stacks,
      }),
    ),
  );

/** Mostly valid type II configurations, sometimes with one field spoiled. */
const nearlyValidConfiguration: fc.Arbitrary<Configuration> = fc
  .record({
    theory: fc.constantFrom<"IIA" | "IIB">("IIA", "IIB"),
    size: fc.integer({ min: 0, max: 5 }),
    levels: fc.integer({ min: 0, max: 5 }),
    // One configuration in three gets one field spoiled.
    spoil: fc.oneof(
      { weight: 2, arbitrary: fc.constant(null) },
      { weight: 1, arbitrary: fc.tuple(fc.constantFrom("count", "worldvolume", "position", "id"), nastyNumber) },
    ),
  })
  .chain(({ theory, size, levels: n, spoil }) =>
    fc.tuple(...Array.from({ length: size }, (_, i) => typeTwoStack(theory, `s${i}`))).map((stacks): Configuration => {
      const copy = stacks.map((stack) => ({ ...stack, position: { ...stack.position } }));
      const target = copy[0];
      if (spoil && target) {
        const [field, value] = spoil;
        if (field === "count") target.count = value;
        if (field === "worldvolume") target.worldvolume = [...target.worldvolume, value];
        if (field === "position") target.position["9"] = value;
        if (field === "id") target.id = copy[1]?.id ?? "";
      }
      return { format: 1, title: "fuzz", theory, stringScaleGeV: null, levels: n, stacks: copy };
    }),
  );

/** A bosonic configuration below or at the critical dimension, usually valid. */
const bosonicConfiguration: fc.Arbitrary<Configuration> = fc
  .record({ d: fc.integer({ min: 2, max: 26 }), size: fc.integer({ min: 0, max: 4 }), levels: fc.integer({ min: 0, max: 4 }) })
  .chain(({ d, size, levels: n }) =>
    fc
      .array(
        fc.record({
          worldvolume: fc.uniqueArray(fc.integer({ min: 1, max: d - 1 }), { maxLength: d - 1 }).map((axes) => axes.sort((x, y) => x - y)),
          count: fc.integer({ min: 1, max: 3 }),
          anti: fc.boolean(),
          y: fc.double({ min: -3, max: 3, noNaN: true }),
        }),
        { minLength: size, maxLength: size },
      )
      .map((raw): Configuration => ({
        format: 1,
        title: "fuzz",
        theory: "bosonic",
        dimension: d,
        stringScaleGeV: 1e18,
        levels: n,
        stacks: raw.map(({ worldvolume: axes, count, anti, y }, index) => {
          const dirichlet = Array.from({ length: d - 1 }, (_, i) => i + 1).find((axis) => !axes.includes(axis));
          return {
            id: `b${index}`,
            label: "",
            count,
            anti,
            worldvolume: axes,
            position: dirichlet === undefined ? {} : { [String(dirichlet)]: y },
          };
        }),
      })),
  );

const anyConfiguration = fc.oneof(wildConfiguration, nearlyValidConfiguration, bosonicConfiguration);

/** True when `path` names an own property reachable from `root` (the value it points at exists). */
function pathExists(root: unknown, path: (string | number)[]): boolean {
  let current: unknown = root;
  for (const key of path) {
    if (current === null || typeof current !== "object" || !Object.prototype.hasOwnProperty.call(current, key)) return false;
    current = (current as Record<string | number, unknown>)[key];
  }
  return true;
}

/** Every number in the result (walked recursively) is finite: nothing turns into NaN or Infinity on its way to JSON. */
function allNumbersFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allNumbersFinite);
  if (value && typeof value === "object") return Object.values(value).every(allNumbersFinite);
  return true;
}

function expectWellFormedProblems(problems: ConfigurationProblem[], configuration: Configuration): void {
  for (const problem of problems) {
    expect(problem.path.length).toBeGreaterThan(0);
    expect(problem.path.every((key) => typeof key === "string" || (Number.isInteger(key) && key >= 0))).toBe(true);
    expect(pathExists(configuration, problem.path)).toBe(true);
    expect(problem.message.trim().length).toBeGreaterThan(0);
  }
}

describe("engine fuzzing", () => {
  it(`checks and computes ${runs} random and malformed configurations without an undocumented exception`, () => {
    let valid = 0;
    let invalid = 0;
    fc.assert(
      fc.property(anyConfiguration, (configuration) => {
        const before = structuredClone(configuration);
        const problems = checkConfiguration(configuration);
        expectWellFormedProblems(problems, configuration);

        let result: SpectrumResult | undefined;
        try {
          result = computeSpectrum(configuration);
        } catch (error) {
          // The only documented exception, carrying exactly what checkConfiguration found.
          expect(error).toBeInstanceOf(ConfigurationError);
          expect((error as ConfigurationError).problems).toEqual(problems);
          expect(problems.length).toBeGreaterThan(0);
          invalid += 1;
        }
        if (result) {
          valid += 1;
          expect(problems).toEqual([]);
          const n = configuration.stacks.length;
          // One sector per unordered pair including each stack with itself: n(n+1)/2 (product.md).
          expect(result.sectors.length).toBe((n * (n + 1)) / 2);
          expect(allNumbersFinite(result)).toBe(true);
        }
        // Inputs are never mutated (check.ts and spectrum.ts promise pure functions).
        expect(isDeepStrictEqual(structuredClone(configuration), before)).toBe(true);
      }),
      { numRuns: runs, seed },
    );
    // Both outcomes are exercised in volume, so the property is not vacuous either way.
    expect(valid).toBeGreaterThan(runs / 10);
    expect(invalid).toBeGreaterThan(runs / 10);
  }, Math.max(600_000, runs * 20));

  describe("edge cases", () => {
    it("reports a NaN count, an infinite position and a fractional level, each at its path", () => {
      const configuration: Configuration = {
        format: 1,
        title: "edge",
        theory: "IIB",
        stringScaleGeV: null,
        levels: 2.5,
        stacks: [{ id: "a", label: "", count: Number.NaN, anti: false, worldvolume: [1, 2, 3], position: { "9": Number.POSITIVE_INFINITY } }],
      };
      expect(checkConfiguration(configuration).map((problem) => problem.path)).toEqual([
        ["levels"],
        ["stacks", 0, "count"],
        ["stacks", 0, "position", "9"],
      ]);
    });

    it("treats a __proto__ position key as a bad axis, not as the prototype", () => {
      const configuration: Configuration = {
        format: 1,
        title: "edge",
        theory: "IIB",
        stringScaleGeV: null,
        levels: 1,
        stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: JSON.parse('{"__proto__": 1}') as Record<string, number> }],
      };
      expect(checkConfiguration(configuration)).toEqual([
        { path: ["stacks", 0, "position", "__proto__"], message: expect.stringContaining('Position key "__proto__"') },
      ]);
    });
  });
});
