import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkConfiguration } from "./check";
import { canonicalPosition } from "./compact";
import { computeSpectrum } from "./spectrum";
import { dualTheory, tDualize } from "./t-duality";
import type { Configuration, Sector, Stack, Theory, TowerState } from "./types";

const twoPi = 2 * Math.PI;

/**
 * Random configurations on circles: 1 to 4 stacks, 1 to 3 compact axes (the last three), radii in
 * [0.7, 1.4], Wilson lines and positions anywhere (positions also negative and beyond 2 pi R), a
 * small mass cap. The cap keeps every tower below the row limit, so towers compare whole.
 */
function compactConfiguration(theory: Theory) {
  const dimension = theory === "bosonic" ? 26 : 10;
  const axes = Array.from({ length: dimension - 1 }, (_, index) => index + 1);
  const radius = fc.double({ min: 0.7, max: 1.4, noNaN: true });
  const angle = fc.double({ min: 0, max: twoPi * 0.999, noNaN: true });
  const position = fc.oneof(fc.constant(0), fc.double({ min: -20, max: 20, noNaN: true }));
  const stack = (id: string, compactAxes: number[]) =>
    fc
      .record({
        neumann: fc.array(fc.boolean(), { minLength: axes.length, maxLength: axes.length }),
        positions: fc.array(position, { minLength: axes.length, maxLength: axes.length }),
        angles: fc.array(angle, { minLength: compactAxes.length, maxLength: compactAxes.length }),
        count: fc.integer({ min: 1, max: 3 }),
        anti: fc.boolean(),
      })
      .map(({ neumann, positions, angles, count, anti }): Stack => {
        const flags = [...neumann];
        const p = flags.filter(Boolean).length;
        // Fix the p parity of type II on axis 1, which is never compact here.
        if (theory !== "bosonic" && (p % 2 === 0) !== (theory === "IIA")) flags[0] = !flags[0];
        const worldvolume = axes.filter((_, index) => flags[index]);
        const stackPosition: Record<string, number> = {};
        axes.forEach((axis, index) => {
          if (!flags[index] && positions[index] !== 0) stackPosition[String(axis)] = positions[index] ?? 0;
        });
        const wilson: Record<string, number> = {};
        compactAxes.forEach((axis, index) => {
          if (worldvolume.includes(axis) && angles[index] !== 0) wilson[String(axis)] = angles[index] ?? 0;
        });
        return { id, label: "", count, anti, worldvolume, position: stackPosition, ...(Object.keys(wilson).length > 0 ? { wilson } : {}) };
      });
  return fc
    .record({
      size: fc.integer({ min: 1, max: 4 }),
      compactAxes: fc.subarray([dimension - 3, dimension - 2, dimension - 1], { minLength: 1 }),
      levels: fc.integer({ min: 0, max: 1 }),
    })
    .chain(({ size, compactAxes, levels }) =>
      fc
        .record({
          radii: fc.array(radius, { minLength: compactAxes.length, maxLength: compactAxes.length }),
          stacks: fc.tuple(...Array.from({ length: size }, (_, index) => stack(`s${index}`, compactAxes))),
          axis: fc.constantFrom(...compactAxes),
        })
        .map(({ radii, stacks, axis }) => {
          const configuration: Configuration = {
            format: 2,
            title: "on circles",
            theory,
            stringScaleGeV: null,
            levels,
            compact: Object.fromEntries(compactAxes.map((entry, index) => [String(entry), radii[index] ?? 1])),
            stacks,
          };
          return { configuration, axis };
        }),
    );
}

const anyTheory = fc.constantFrom<Theory>("bosonic", "IIA", "IIB").chain(compactConfiguration);

/** One tower state in a form that T_k leaves unchanged: numbers by axis, whatever their kind. */
function stateKey(state: TowerState): string {
  const numbers = { ...state.momentum, ...state.winding };
  const axes = Object.keys(numbers).sort((x, y) => Number(x) - Number(y));
  return [state.sector, state.level, axes.map((axis) => `${axis}:${numbers[axis]}`).join(","), state.states, state.withChanPaton].join("|");
}

/** Each sector's tower, keyed by pair, as sorted state keys with their alpha' M^2. */
function towers(sectors: readonly Sector[]): Map<string, { key: string; massSquared: number }[]> {
  const byPair = new Map<string, { key: string; massSquared: number }[]>();
  for (const sector of sectors) {
    const states = (sector.tower ?? []).map((state) => ({ key: stateKey(state), massSquared: readNumber(state.massSquared) }));
    states.sort((x, y) => (x.key < y.key ? -1 : x.key > y.key ? 1 : 0));
    byPair.set(sector.pair.join("/"), states);
  }
  return byPair;
}

function readNumber(text: string): number {
  const [num, den] = text.split("/");
  return den === undefined ? Number(num) : Number(num) / Number(den);
}

function closeTo(x: number, y: number): boolean {
  return Math.abs(x - y) <= 1e-9 * Math.max(1, Math.abs(x), Math.abs(y));
}

describe("tDualize", () => {
  // T-duality invariance of the open-string spectrum, state by state with n <-> w on the dualised
  // axis (Polchinski vol. 1, sections 8.6-8.7, from memory): a property over thousands of configurations.
  it("gives the same spectrum state by state, momentum and winding exchanged on the dualised axis", () => {
    fc.assert(
      fc.property(anyTheory, ({ configuration, axis }) => {
        expect(checkConfiguration(configuration)).toEqual([]);
        const dual = tDualize(configuration, axis);
        expect(checkConfiguration(dual)).toEqual([]);
        const before = computeSpectrum(configuration);
        const after = computeSpectrum(dual);
        const towersBefore = towers(before.sectors);
        const towersAfter = towers(after.sectors);
        expect([...towersAfter.keys()]).toEqual([...towersBefore.keys()]);
        for (const sector of [...before.sectors, ...after.sectors]) expect(sector.towerTruncated).toBe(false);
        for (const [pair, states] of towersBefore) {
          const dualStates = towersAfter.get(pair) ?? [];
          expect(dualStates.map((state) => state.key)).toEqual(states.map((state) => state.key));
          states.forEach((state, index) => expect(closeTo(state.massSquared, dualStates[index]?.massSquared ?? NaN)).toBe(true));
        }
        // The lightest states (nearest images and lightest momenta) and the gauge groups agree as well.
        before.sectors.forEach((sector, index) => {
          const dualSector = after.sectors[index] as Sector;
          expect(dualSector.nu).toBe(sector.nu);
          expect(dualSector.levels.map((row) => [row.sector, row.level, row.states, row.withChanPaton])).toEqual(
            sector.levels.map((row) => [row.sector, row.level, row.states, row.withChanPaton]),
          );
          sector.levels.forEach((row, rowIndex) =>
            expect(closeTo(readNumber(row.massSquared), readNumber(dualSector.levels[rowIndex]?.massSquared ?? "NaN"))).toBe(true),
          );
        });
        expect(after.gaugeGroup).toBe(before.gaugeGroup);
        expect(after.supercharges).toBe(before.supercharges);
      }),
      { numRuns: 2000 },
    );
    // Thousands of full spectra take tens of seconds on a shared machine.
  }, 300_000);

  it("is the identity when applied twice, positions read modulo 2 pi R", () => {
    fc.assert(
      fc.property(anyTheory, ({ configuration, axis }) => {
        const twice = tDualize(tDualize(configuration, axis), axis);
        const key = String(axis);
        const radius = configuration.compact?.[key] ?? NaN;
        expect(twice.theory).toBe(configuration.theory);
        expect(closeTo(twice.compact?.[key] ?? NaN, radius)).toBe(true);
        twice.stacks.forEach((stack, index) => {
          const original = configuration.stacks[index] as Stack;
          expect(stack.worldvolume).toEqual(original.worldvolume);
          expect(closeTo(stack.wilson?.[key] ?? 0, original.wilson?.[key] ?? 0)).toBe(true);
          if (!original.worldvolume.includes(axis)) {
            const back = stack.position[key] ?? 0;
            const start = canonicalPosition(original.position[key] ?? 0, radius);
            // Equal on the circle: the difference is a multiple of 2 pi R up to rounding.
            const turns = (back - start) / (twoPi * radius);
            expect(Math.abs(turns - Math.round(turns))).toBeLessThan(1e-9);
          }
          for (const other of Object.keys(original.position).filter((entry) => entry !== key)) {
            expect(stack.position[other]).toBe(original.position[other]);
          }
        });
      }),
      { numRuns: 3000 },
    );
  }, 60_000);

  // A Wilson line theta becomes the position x = theta R' on the dual circle, R' = alpha' / R
  // (Polchinski vol. 1, section 8.6, from memory).
  it("turns a Wilson line into the position theta R' and a Dp into a D(p - 1) of the other type II theory", () => {
    const configuration: Configuration = {
      format: 2,
      title: "D9 with a Wilson line",
      theory: "IIB",
      stringScaleGeV: null,
      levels: 1,
      compact: { "9": 2 },
      stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9], position: {}, wilson: { "9": 1.5 } }],
    };
    const dual = tDualize(configuration, 9);
    expect(dual.theory).toBe("IIA");
    expect(dual.compact).toEqual({ "9": 0.5 });
    expect(dual.stacks[0]?.worldvolume).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(dual.stacks[0]?.position).toEqual({ "9": 0.75 });
    expect(dual.stacks[0]?.wilson).toBeUndefined();
    expect(configuration.stacks[0]?.wilson).toEqual({ "9": 1.5 });
  });

  it("turns a position into the Wilson line x / R, read modulo 2 pi", () => {
    const configuration: Configuration = {
      format: 1,
      title: "D0",
      theory: "IIA",
      stringScaleGeV: null,
      levels: 1,
      compact: { "9": 1 },
      stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [], position: { "9": -1 } }],
    };
    const dual = tDualize(configuration, 9);
    expect(dual.format).toBe(2);
    expect(dual.theory).toBe("IIB");
    expect(dual.stacks[0]?.worldvolume).toEqual([9]);
    expect(dual.stacks[0]?.wilson?.["9"]).toBeCloseTo(twoPi - 1, 12);
  });

  describe("edge cases", () => {
    it("refuses a non-compact axis", () => {
      const configuration: Configuration = { format: 2, title: "t", theory: "IIA", stringScaleGeV: null, levels: 1, stacks: [] };
      expect(() => tDualize(configuration, 9)).toThrow(RangeError);
    });

    it("keeps the bosonic theory and exchanges the two type II theories", () => {
      expect(dualTheory("bosonic")).toBe("bosonic");
      expect(dualTheory("IIA")).toBe("IIB");
      expect(dualTheory("IIB")).toBe("IIA");
    });
  });
});
