import { describe, expect, it } from "vitest";
import { checkConfiguration } from "./check";
import { canonicalPosition, compactLimits, computeTower, towerRowLimit, turnsOnCircle } from "./compact";
import { resultInputKey } from "./result-key";
import { computeSpectrum } from "./spectrum";
import type { Configuration, Sector, Stack } from "./types";

const twoPi = 2 * Math.PI;
const bosonicSpace = Array.from({ length: 25 }, (_, index) => index + 1);

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function configuration(extra: Partial<Configuration>): Configuration {
  return { format: 2, title: "circle", theory: "IIA", stringScaleGeV: null, levels: 1, stacks: [], ...extra };
}

function sectorOf(result: ReturnType<typeof computeSpectrum>, a: string, b: string): Sector {
  const sector = result.sectors.find((entry) => entry.pair[0] === a && entry.pair[1] === b);
  if (!sector) throw new Error(`no sector ${a}/${b}`);
  return sector;
}

describe("compact axes in computeSpectrum", () => {
  // W-boson masses of two D0s on a circle: M = |Delta x + 2 pi R w| / (2 pi alpha'), one tower state per
  // winding w of the stretched string (common practice).
  it("gives the stretched strings of every winding the W-boson mass |Delta x + 2 pi R w| / 2 pi", () => {
    const radius = 1.5;
    const delta = 2.25;
    const result = computeSpectrum(
      configuration({ levels: 3, compact: { "9": radius }, stacks: [stack("a", [], { position: { "9": 0 } }), stack("b", [], { position: { "9": delta } })] }),
    );
    const sector = sectorOf(result, "a", "b");
    const vectors = (sector.tower ?? []).filter((state) => state.sector === "NS" && state.level === "1/2");
    const windings = vectors.map((state) => state.winding["9"] ?? NaN).sort((x, y) => x - y);
    // alpha' M^2 = ((Delta x + 2 pi R w) / 2 pi)^2 <= 3 holds for w = -1, 0 only (w = 1 gives 4.1, w = -2 gives 3.2).
    expect(windings).toEqual([-1, 0]);
    for (const state of vectors) {
      const w = state.winding["9"] ?? NaN;
      expect(state.mass).toBeCloseTo(Math.abs(delta + twoPi * radius * w) / twoPi, 12);
      expect(state.withChanPaton).toBe("16");
    }
    expect(sector.compactAxes).toEqual([{ axis: 9, type: "DD", radius, scale: radius, offset: delta / (twoPi * radius) }]);
  });

  // Open strings on a circle with Wilson lines: p = (n + (theta_b - theta_a) / 2 pi) / R, so
  // alpha' M^2 = N - 1 + ((2 pi n + theta_b - theta_a) / (2 pi R))^2 in the bosonic string
  // (Polchinski vol. 1, section 8.6, from memory).
  it("shifts the momentum of strings between stacks with different Wilson lines", () => {
    const radius = 2;
    const theta = 1.2;
    const result = computeSpectrum(
      configuration({
        theory: "bosonic",
        levels: 0,
        compact: { "25": radius },
        stacks: [stack("a", bosonicSpace), stack("b", bosonicSpace, { wilson: { "25": theta } })],
      }),
    );
    const between = sectorOf(result, "a", "b");
    const tachyons = (between.tower ?? []).filter((state) => state.level === "0");
    expect(tachyons.length).toBeGreaterThan(2);
    for (const state of tachyons) {
      const n = state.momentum["25"] ?? NaN;
      expect(Number(state.massSquared)).toBeCloseTo(-1 + ((twoPi * n + theta) / (twoPi * radius)) ** 2, 10);
    }
    // The stack with itself has no shift: exact n^2 / R^2 - 1 with R = 2.
    const own = sectorOf(result, "a", "a");
    expect((own.tower ?? []).filter((state) => state.level === "0").map((state) => [state.momentum["25"], state.massSquared])).toEqual([
      [0, "-1"],
      [-1, "-3/4"],
      [1, "-3/4"],
      [-2, "0"],
      [2, "0"],
    ]);
    // Different Wilson lines break U(1) x U(1) -> nothing enhanced; equal ones give U(2) (common practice).
    expect(result.gaugeGroup).toBe("U(1) x U(1)");
    const aligned = computeSpectrum(
      configuration({
        theory: "bosonic",
        levels: 0,
        compact: { "25": radius },
        stacks: [stack("a", bosonicSpace, { wilson: { "25": theta } }), stack("b", bosonicSpace, { wilson: { "25": theta } })],
      }),
    );
    expect(aligned.gaugeGroup).toBe("U(2)");
  });

  it("measures the separation to the nearest image and enhances stacks a whole turn apart", () => {
    const result = computeSpectrum(
      configuration({
        levels: 1,
        compact: { "9": 1 },
        stacks: [stack("a", [], { position: { "9": 0.5 } }), stack("b", [], { position: { "9": twoPi - 0.5 } }), stack("c", [], { position: { "9": 0.5 + twoPi } })],
      }),
    );
    const ab = sectorOf(result, "a", "b");
    expect(ab.separation).toBeCloseTo(1, 12);
    // The lightest stretched state is the W boson of the nearest image: (y / 2 pi)^2 with y = 1 (common practice).
    expect(Number(ab.levels.find((row) => row.sector === "NS" && row.level === "1/2")?.massSquared)).toBeCloseTo(1 / (twoPi * twoPi), 10);
    expect(sectorOf(result, "a", "c").separation).toBeCloseTo(0, 9);
    expect(result.gaugeGroup).toBe("U(2) x U(1)");
  });

  it("finds a brane-antibrane pair tachyonic at every position when the circle is shorter than the critical separation", () => {
    // y_c = pi sqrt(2) ~ 4.44 (Banks and Susskind 1995, from memory); two D8s are apart along x9 only,
    // and on a circle of radius 1 the nearest image is never further than pi R ~ 3.14.
    const walls = [1, 2, 3, 4, 5, 6, 7, 8];
    const pair = (radius: number, x: number) =>
      computeSpectrum(
        configuration({ levels: 1, compact: { "9": radius }, stacks: [stack("a", walls, { position: { "9": 0 } }), stack("b", walls, { anti: true, position: { "9": x } })] }),
      );
    const ab = sectorOf(pair(1, Math.PI), "a", "b");
    expect(ab.separation).toBeCloseTo(Math.PI, 12);
    expect(ab.tachyonic).toBe(true);
    expect(ab.notes.some((note) => note.includes("tachyonic wherever the stacks sit"))).toBe(true);
    // On a circle of radius 2 the walls can be pi R ~ 6.28 apart, beyond y_c: no such note.
    expect(sectorOf(pair(2, 1), "a", "b").notes.some((note) => note.includes("tachyonic wherever"))).toBe(false);
    // Two D0s can also move apart along the eight flat axes: no such note either.
    const points = computeSpectrum(
      configuration({ levels: 1, compact: { "9": 1 }, stacks: [stack("a", [], { position: { "9": 0 } }), stack("b", [], { anti: true, position: { "9": 1 } })] }),
    );
    expect(sectorOf(points, "a", "b").notes.some((note) => note.includes("tachyonic wherever"))).toBe(false);
  });

  it("leaves format 1 results without tower fields", () => {
    const result = computeSpectrum({ ...configuration({ stacks: [stack("a", [])] }), format: 1 });
    expect(result.sectors[0]).not.toHaveProperty("tower");
    expect(result.sectors[0]).not.toHaveProperty("compactAxes");
  });

  it("writes alpha' M^2 exactly where it is rational", () => {
    // R = 0.4 on an NN axis: p^2 = n^2 / R^2 = 25 n^2 / 4.
    const result = computeSpectrum(configuration({ theory: "IIB", levels: 7, compact: { "9": 0.4 }, stacks: [stack("a", [9])] }));
    const states = (result.sectors[0]?.tower ?? []).filter((state) => state.sector === "NS" && state.level === "1/2");
    expect(states.map((state) => [state.momentum["9"], state.massSquared])).toEqual([
      [0, "0"],
      [-1, "25/4"],
      [1, "25/4"],
    ]);
  });

  it("keeps the lightest rows and says so when more lie within the cap", () => {
    const result = computeSpectrum(configuration({ levels: 100, compact: { "9": 0.01 }, stacks: [stack("a", [])] }));
    const sector = result.sectors[0] as Sector;
    expect(sector.towerTruncated).toBe(true);
    expect(sector.tower?.length).toBe(compactLimits.maxTowerRows);
    const masses = (sector.tower ?? []).map((state) => Number(state.massSquared));
    expect(masses).toEqual([...masses].sort((x, y) => x - y));
  });
});

describe("checkCompactAxes (through checkConfiguration)", () => {
  it("names each problem at its JSON path", () => {
    const problems = checkConfiguration({
      format: 1,
      title: "t",
      theory: "IIA",
      stringScaleGeV: null,
      levels: 1,
      compact: { "9": -1, "12": 1 },
      stacks: [stack("a", [1, 2], { wilson: { "1": 0.5, "2": 7 } }), stack("b", [], { wilson: { "9": 1 } })],
    });
    expect(problems.map((problem) => problem.path)).toEqual([
      ["format"],
      ["compact", "9"],
      ["compact", "12"],
      ["stacks", 0, "wilson", "1"],
      ["stacks", 0, "wilson", "2"],
      ["stacks", 0, "wilson", "2"],
      ["stacks", 1, "wilson", "9"],
    ]);
  });

  it("accepts a format 2 configuration on circles", () => {
    expect(checkConfiguration(configuration({ compact: { "9": 2.5 }, stacks: [stack("a", [8, 9], { wilson: { "9": 1.2 } }), stack("b", [], { position: { "9": 20 } })] }))).toEqual([]);
  });
});

describe("turnsOnCircle and canonicalPosition", () => {
  it("reads positions modulo 2 pi R", () => {
    expect(turnsOnCircle(-Math.PI / 2, twoPi)).toBeCloseTo(0.75, 15);
    expect(canonicalPosition(-1, 1)).toBeCloseTo(twoPi - 1, 12);
    expect(canonicalPosition(3 * twoPi + 0.25, 1)).toBeCloseTo(0.25, 12);
  });

  describe("edge cases", () => {
    it("reads a value a rounding error short of a whole turn as 0", () => {
      expect(turnsOnCircle(-2.220446049250313e-16, twoPi * 0.6)).toBe(0);
      expect(turnsOnCircle(twoPi - 1e-15, twoPi)).toBe(0);
    });
  });
});

describe("computeTower", () => {
  it("lists levels and momenta lightest first", () => {
    const level = (exactValue: number) => ({
      kind: "bosonic" as const,
      level: String(exactValue + 1),
      exact: { num: BigInt(exactValue), den: 1n },
      exactValue,
      states: "1",
      withChanPaton: "1",
    });
    const { rows, truncated } = computeTower({
      terms: [{ axis: 9, type: "NN", radius: 1, scale: 1, offset: 0 }],
      flatStretch: 0,
      levels: [[level(-1), level(0)]],
      cap: 1,
      limit: 50,
      stringScaleGeV: null,
    });
    expect(truncated).toBe(false);
    expect(rows.map((row) => [row.momentum["9"], row.massSquared])).toEqual([
      [0, "-1"],
      [-1, "0"],
      [0, "0"],
      [1, "0"],
      [-1, "1"],
      [1, "1"],
    ]);
  });
});

describe("towerRowLimit", () => {
  it("spreads the result's rows over its sectors", () => {
    expect(towerRowLimit(78)).toBe(200);
    expect(towerRowLimit(2080)).toBe(19);
    expect(towerRowLimit(100_000)).toBe(8);
  });
});

describe("resultInputKey with compact axes", () => {
  it("changes with a radius or a Wilson line, not with a zero Wilson line", () => {
    const base = configuration({ compact: { "9": 2 }, stacks: [stack("a", [9])] });
    expect(resultInputKey({ ...base, compact: { "9": 3 } })).not.toBe(resultInputKey(base));
    expect(resultInputKey({ ...base, stacks: [stack("a", [9], { wilson: { "9": 1 } })] })).not.toBe(resultInputKey(base));
    expect(resultInputKey({ ...base, stacks: [stack("a", [9], { wilson: { "9": 0 } })] })).toBe(resultInputKey(base));
  });
});
