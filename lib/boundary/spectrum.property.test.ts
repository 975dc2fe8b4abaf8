import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseRational, rationalToNumber } from "./rational";
import { computeSector, computeSpectrum, createSectorContext } from "./spectrum";
import type { Configuration, LevelRow, Sector, SpectrumResult, Stack, Theory } from "./types";

// Positions are multiples of 1/4 from a short list, so that stacks often coincide and every
// difference and translation below is exact in floating point.
const positionValue = fc.constantFrom(0, 0, 0.5, 1.25, -2, 3.75);
const typeTwoAxes = [1, 2, 3, 4, 5, 6, 7, 8, 9];

/** A stack of a type II theory with the p parity fixed afterwards (axis 9 toggled if needed). */
function typeTwoStack(theory: "IIA" | "IIB", id: string) {
  return fc
    .record({
      neumann: fc.array(fc.boolean(), { minLength: 9, maxLength: 9 }),
      positions: fc.array(positionValue, { minLength: 9, maxLength: 9 }),
      count: fc.integer({ min: 1, max: 5 }),
      anti: fc.boolean(),
    })
    .map(({ neumann, positions, count, anti }): Stack => {
      const flags = [...neumann];
      const p = flags.filter(Boolean).length;
      if ((p % 2 === 0) !== (theory === "IIA")) flags[8] = !flags[8];
      const worldvolume = typeTwoAxes.filter((_, index) => flags[index]);
      const position: Record<string, number> = {};
      typeTwoAxes.forEach((axis, index) => {
        if (!flags[index]) position[String(axis)] = positions[index] ?? 0;
      });
      return { id, label: "", count, anti, worldvolume, position };
    });
}

const typeTwoConfiguration = fc
  .record({ theory: fc.constantFrom<"IIA" | "IIB">("IIA", "IIB"), size: fc.integer({ min: 1, max: 4 }) })
  .chain(({ theory, size }) =>
    fc
      .tuple(...Array.from({ length: size }, (_, i) => typeTwoStack(theory, `s${i}`)))
      .map((stacks): Configuration => ({ format: 1, title: "property", theory, stringScaleGeV: null, levels: 3, stacks })),
  );

/** Two stacks at the origin that differ on exactly nu axes (nu even keeps the p parity). */
function pairWithNu(nuChoices: number[]) {
  return fc
    .record({
      nu: fc.constantFrom(...nuChoices),
      base: fc.subarray(typeTwoAxes),
      flipOrder: fc.shuffledSubarray(typeTwoAxes, { minLength: 9, maxLength: 9 }),
      antiA: fc.boolean(),
      antiB: fc.boolean(),
      countA: fc.integer({ min: 1, max: 4 }),
      countB: fc.integer({ min: 1, max: 4 }),
    })
    .map(({ nu, base, flipOrder, antiA, antiB, countA, countB }) => {
      const flipped = new Set(flipOrder.slice(0, nu));
      const other = typeTwoAxes.filter((axis) => base.includes(axis) !== flipped.has(axis));
      const theory: Theory = base.length % 2 === 0 ? "IIA" : "IIB";
      const a: Stack = { id: "a", label: "", count: countA, anti: antiA, worldvolume: base, position: {} };
      const b: Stack = { id: "b", label: "", count: countB, anti: antiB, worldvolume: other, position: {} };
      return { nu, theory, a, b };
    });
}

function configurationOf(theory: Theory, stacks: Stack[], levels = 4): Configuration {
  return { format: 1, title: "property", theory, stringScaleGeV: null, levels, stacks };
}

/** The orientation-independent physics of a sector. */
function physicsOf(sector: Sector) {
  return {
    nn: sector.nn,
    dd: sector.dd,
    nu: sector.nu,
    separation: sector.separation,
    chanPaton: sector.chanPaton,
    zeroPoint: sector.zeroPoint,
    tachyonic: sector.tachyonic,
    criticalSeparation: sector.criticalSeparation,
    supersymmetric: sector.supersymmetric,
    levels: sector.levels.map(({ sector: kind, level, massSquared, mass, states, withChanPaton }) => ({
      kind,
      level,
      massSquared,
      mass,
      states,
      withChanPaton,
    })),
    massless: sector.massless.map(({ sector: kind, states, withChanPaton }) => ({ kind, states, withChanPaton })),
  };
}

/** A result without the mode expansions' endpoint positions, which are absolute on purpose. */
function withoutLatex(result: SpectrumResult) {
  return {
    ...result,
    sectors: result.sectors.map((sector) => ({ ...sector, axes: sector.axes.map(({ positionA: _a, positionB: _b, ...axis }) => axis) })),
  };
}

function massSquaredOf(row: Pick<LevelRow, "massSquared">): number {
  return row.massSquared.includes("/") || /^-?\d+$/.test(row.massSquared)
    ? rationalToNumber(parseRational(row.massSquared))
    : Number(row.massSquared);
}

/** withChanPaton by exact alpha' M^2 for one sector kind. */
function totalsByMass(sector: Sector, kind: "NS" | "R"): Map<string, string> {
  return new Map(sector.levels.filter((row) => row.sector === kind).map((row) => [row.massSquared, row.withChanPaton]));
}

describe("computeSpectrum properties", () => {
  it("gives the same physics for (a, b) and (b, a), with ND and DN swapped", () => {
    fc.assert(
      fc.property(typeTwoConfiguration, (configuration) => {
        const context = createSectorContext(configuration);
        const [a, b] = configuration.stacks;
        if (!a || !b) return;
        const forward = computeSector(a, b, configuration, context);
        const backward = computeSector(b, a, configuration, context);
        expect(physicsOf(backward)).toEqual(physicsOf(forward));
        const mirror = { NN: "NN", DD: "DD", ND: "DN", DN: "ND" } as const;
        expect(backward.axes.map((axis) => axis.type)).toEqual(forward.axes.map((axis) => mirror[axis.type]));
      }),
      { numRuns: 60 },
    );
  });

  it("does not depend on the order of the stacks", () => {
    fc.assert(
      fc.property(
        typeTwoConfiguration.chain((configuration) =>
          fc
            .shuffledSubarray(configuration.stacks, { minLength: configuration.stacks.length, maxLength: configuration.stacks.length })
            .map((shuffled) => [configuration, { ...configuration, stacks: shuffled }] as const),
        ),
        ([original, shuffled]) => {
          expect(computeSpectrum(shuffled)).toEqual(computeSpectrum(original));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("does not change under a common translation of all positions (LaTeX aside)", () => {
    fc.assert(
      fc.property(
        typeTwoConfiguration,
        fc.array(fc.integer({ min: -40, max: 40 }), { minLength: 9, maxLength: 9 }),
        (configuration, quarterShifts) => {
          const translated: Configuration = {
            ...configuration,
            stacks: configuration.stacks.map((stack) => {
              const position: Record<string, number> = {};
              for (const axis of typeTwoAxes) {
                if (!stack.worldvolume.includes(axis)) {
                  position[String(axis)] = (stack.position[String(axis)] ?? 0) + (quarterShifts[axis - 1] ?? 0) / 4;
                }
              }
              return { ...stack, position };
            }),
          };
          expect(withoutLatex(computeSpectrum(translated))).toEqual(withoutLatex(computeSpectrum(configuration)));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("has even nu in every type II sector (p of equal parity)", () => {
    fc.assert(
      fc.property(typeTwoConfiguration, (configuration) => {
        for (const sector of computeSpectrum(configuration).sectors) expect(sector.nu % 2).toBe(0);
      }),
      { numRuns: 60 },
    );
  });

  it("gives NS and R the same totals at every alpha' M^2 for nu = 0 and 4 with equal orientation (Green, Schwarz and Witten vol. 1, chapter 4; Polchinski vol. 2, section 13.4; both from memory)", () => {
    fc.assert(
      fc.property(pairWithNu([0, 4]), ({ theory, a, b }) => {
        const levels = 4;
        const result = computeSpectrum(configurationOf(theory, [a, { ...b, anti: a.anti }], levels));
        const pair = result.sectors.find((sector) => sector.pair[0] === "a" && sector.pair[1] === "b");
        if (!pair) throw new Error("missing sector");
        const ns = totalsByMass(pair, "NS");
        const r = totalsByMass(pair, "R");
        // NS rows reach alpha' M^2 = levels + a_NS, R rows levels + a_R: compare where both are listed.
        const shared = [...r.keys()].filter((mass) => massSquaredOf({ massSquared: mass }) <= levels + rationalToNumber(parseRational(pair.zeroPoint.NS ?? "0")));
        expect(shared.length).toBeGreaterThan(2);
        for (const mass of shared) expect(ns.get(mass)).toBe(r.get(mass));
      }),
      { numRuns: 40 },
    );
  });

  it("gives NS and R the same totals at nu = 8 except for the single R ground state (Polchinski vol. 2, section 13.4, from memory)", () => {
    fc.assert(
      fc.property(pairWithNu([8]), ({ theory, a, b }) => {
        const result = computeSpectrum(configurationOf(theory, [a, b], 4));
        const pair = result.sectors.find((sector) => sector.pair[0] === "a" && sector.pair[1] === "b");
        if (!pair) throw new Error("missing sector");
        const ns = totalsByMass(pair, "NS");
        const r = totalsByMass(pair, "R");
        // The unpaired ground state: one state in one orientation, times N_a N_b.
        expect(r.get("0")).toBe(String(a.count * b.count));
        expect(ns.has("0")).toBe(false);
        for (const [mass, total] of r) {
          if (mass !== "0") expect(ns.get(mass)).toBe(total);
        }
      }),
      { numRuns: 30 },
    );
  });

  it("puts y_c where the lightest alpha' M^2 crosses zero", () => {
    fc.assert(
      fc.property(pairWithNu([0, 2, 4, 6]), fc.constantFrom(0.999, 1.001), ({ theory, a, b }, factor) => {
        const atOrigin = computeSpectrum(configurationOf(theory, [a, b], 1));
        const pair = atOrigin.sectors.find((sector) => sector.pair[0] === "a" && sector.pair[1] === "b");
        if (!pair) throw new Error("missing sector");
        const yc = pair.criticalSeparation;
        if (yc === null) {
          // No tachyon at y = 0, or no common Dirichlet axis to pull the stacks apart along.
          expect(pair.tachyonic === false || pair.dd === 0).toBe(true);
          return;
        }
        const axis = pair.axes.find((entry) => entry.type === "DD")?.axis ?? 0;
        const moved = { ...b, position: { ...b.position, [String(axis)]: yc * factor } };
        const separated = computeSpectrum(configurationOf(theory, [a, moved], 1));
        const sector = separated.sectors.find((entry) => entry.pair[0] === "a" && entry.pair[1] === "b");
        if (!sector) throw new Error("missing sector");
        const lightest = Math.min(...sector.levels.map(massSquaredOf));
        expect(sector.tachyonic).toBe(factor < 1);
        expect(lightest < 0).toBe(factor < 1);
      }),
      { numRuns: 60 },
    );
  });

  it("has Chan-Paton totals N_a^2 for a stack with itself and 2 N_a N_b for a pair", () => {
    fc.assert(
      fc.property(typeTwoConfiguration, (configuration) => {
        const counts = new Map(configuration.stacks.map((stack) => [stack.id, stack.count]));
        for (const sector of computeSpectrum(configuration).sectors) {
          const na = counts.get(sector.pair[0]) ?? 0;
          const nb = counts.get(sector.pair[1]) ?? 0;
          const self = sector.pair[0] === sector.pair[1];
          expect(sector.chanPaton).toBe(self ? na * na : 2 * na * nb);
          for (const row of sector.levels) {
            if (row.states !== null) {
              // Equal orientations: the total is chanPaton times the per-orientation count.
              expect(row.withChanPaton).toBe((BigInt(sector.chanPaton) * BigInt(row.states)).toString());
            }
          }
        }
      }),
      { numRuns: 60 },
    );
  });
});
