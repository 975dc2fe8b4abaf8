import { describe, expect, it } from "vitest";
import { checkConfiguration } from "./check";
import { omegaTwistedCounts } from "./orientifold";
import { computeSpectrum } from "./spectrum";
import { formatRational } from "./rational";
import { planeCharge } from "./tadpole";
import type { Configuration, OrientifoldPlane, Stack } from "./types";

const axes = (...list: number[]): number[] => list;
const all9 = axes(1, 2, 3, 4, 5, 6, 7, 8, 9);
const stack = (id: string, count: number, worldvolume: number[], position: Record<string, number> = {}, anti = false): Stack => ({
  id,
  label: "",
  count,
  anti,
  worldvolume,
  position,
});
const plane = (type: "O-" | "O+", worldvolume: number[], position: Record<string, number> = {}): OrientifoldPlane => ({
  id: "o",
  type,
  worldvolume,
  position,
});
const config = (theory: Configuration["theory"], stacks: Stack[], planes: OrientifoldPlane[], levels = 1): Configuration => ({
  format: 2,
  title: "orientifold test",
  theory,
  stringScaleGeV: null,
  levels,
  stacks,
  orientifolds: planes,
});
const row = (result: ReturnType<typeof computeSpectrum>, pair: [string, string], sector: string, level: string) =>
  result.sectors.find((s) => s.pair[0] === pair[0] && s.pair[1] === pair[1])?.levels.find((r) => r.sector === sector && r.level === level);

describe("orientifold: type I from 16 D9 branes on an O9- plane", () => {
  // Common practice, from memory (Polchinski vol. 2, section 13.2): 16 D9 with their 16 images cancel the O9- charge, SO(32).
  const result = computeSpectrum(config("IIB", [stack("d9", 16, all9)], [plane("O-", all9)]));
  it("cancels the tadpole and gives SO(32)", () => {
    expect(result.gaugeGroup).toBe("SO(32)");
    expect(result.orientifold?.tadpoles).toEqual([expect.objectContaining({ p: 9, stacks: "16", planes: "-16", net: "0", status: "cancelled" })]);
    expect(result.warnings.some((warning) => /not cancelled/.test(warning))).toBe(false);
  });
  it("the massless vector and gaugino fill the adjoint, 32 * 31 / 2 = 496 labels, with 8 states each", () => {
    expect(row(result, ["d9", "d9"], "NS", "1/2")?.withChanPaton).toBe(String(8 * 496));
    expect(row(result, ["d9", "d9"], "R", "0")?.withChanPaton).toBe(String(8 * 496));
  });
  it("the first massive level is in the symmetric, 32 * 33 / 2 = 528 (Omega alternates level by level; common practice, from memory)", () => {
    expect(row(result, ["d9", "d9"], "NS", "3/2")?.projected).toEqual({ symmetric: "128", antisymmetric: "0" });
    expect(row(result, ["d9", "d9"], "NS", "3/2")?.withChanPaton).toBe(String(128 * 528));
  });
  it("an O9+ plane gives USp(32) and an uncancelled tadpole that 32 anti-D9 branes would cancel", () => {
    const plus = computeSpectrum(config("IIB", [stack("d9", 16, all9)], [plane("O+", all9)]));
    expect(plus.gaugeGroup).toBe("USp(32)");
    const entry = plus.orientifold?.tadpoles[0];
    expect(entry?.status).toBe("tadpole");
    expect(entry?.net).toBe("32");
    expect(entry?.toCancel).toMatch(/Add 32 anti-D9 branes/);
    expect(plus.warnings.some((warning) => /RR tadpole is not cancelled/.test(warning))).toBe(true);
  });
  it("15 D9 branes leave one unit and say that one more D9 brane cancels it", () => {
    const short = computeSpectrum(config("IIB", [stack("d9", 15, all9)], [plane("O-", all9)]));
    expect(short.orientifold?.tadpoles[0]?.toCancel).toMatch(/Add 1 D9 brane /);
  });
});

describe("orientifold: SO(2N) and USp(2N) on the plane", () => {
  it("adjoint dimensions N(2N - 1) on an O3- and N(2N + 1) on an O3+, all 8 massless states in the adjoint (4d N = 4; common practice)", () => {
    for (const n of [1, 2, 3, 5]) {
      const minus = computeSpectrum(config("IIB", [stack("d3", n, axes(1, 2, 3))], [plane("O-", axes(1, 2, 3))]));
      const plus = computeSpectrum(config("IIB", [stack("d3", n, axes(1, 2, 3))], [plane("O+", axes(1, 2, 3))]));
      expect(minus.gaugeGroup).toBe(`SO(${2 * n})`);
      expect(plus.gaugeGroup).toBe(`USp(${2 * n})`);
      expect(row(minus, ["d3", "d3"], "NS", "1/2")?.withChanPaton).toBe(String(8 * n * (2 * n - 1)));
      expect(row(plus, ["d3", "d3"], "NS", "1/2")?.withChanPaton).toBe(String(8 * n * (2 * n + 1)));
    }
  });
  it("D5 branes on an O9- plane carry USp with the four transverse scalars in the antisymmetric (Gimon and Polchinski 1996, from memory)", () => {
    const result = computeSpectrum(config("IIB", [stack("d9", 16, all9), stack("d5", 2, axes(1, 2, 3, 4, 5))], [plane("O-", all9)]));
    expect(result.gaugeGroup).toBe("SO(32) x USp(4)");
    expect(row(result, ["d5", "d5"], "NS", "1/2")?.projected).toEqual({ symmetric: "4", antisymmetric: "4" });
  });
  it("the bosonic tachyon of SO(N) is in the symmetric and the vector in the antisymmetric (Polchinski vol. 1, section 6.5, from memory)", () => {
    const bosonic = Array.from({ length: 25 }, (_, index) => index + 1);
    const result = computeSpectrum(config("bosonic", [stack("a", 2, bosonic)], [plane("O-", bosonic)]));
    expect(row(result, ["a", "a"], "bosonic", "0")?.projected).toEqual({ symmetric: "1", antisymmetric: "0" });
    expect(row(result, ["a", "a"], "bosonic", "1")?.projected).toEqual({ symmetric: "0", antisymmetric: "24" });
  });
  it("the Omega split is whole and non-negative at every level for nu' = 0, 4, 8 (a check of the twisted series)", () => {
    for (const flipped of [0, 4, 8]) {
      for (const kind of ["NS", "R"] as const) {
        const twist = omegaTwistedCounts(kind, flipped, 10, 20);
        const result = computeSpectrum(
          config("IIB", [stack("s", 1, axes(1, 2, 3, 4, 5, 6, 7, 8, 9).slice(0, 9 - flipped))], [plane("O-", all9.slice(0, 9 - flipped))], 10),
        );
        const sector = result.sectors[0];
        for (const level of sector?.levels.filter((r) => r.sector === kind) ?? []) {
          const split = level.projected;
          expect(split).toBeDefined();
          expect(BigInt(split?.symmetric ?? "-1") + BigInt(split?.antisymmetric ?? "-1")).toBe(BigInt(level.states ?? "0"));
        }
        expect(twist.size).toBeGreaterThan(0);
      }
    }
  });
});

describe("orientifold: images and the strings between a stack and its image", () => {
  const result = computeSpectrum(config("IIB", [stack("a", 3, axes(1, 2, 3), { "9": 1.25, "5": 0.5 })], [plane("O-", axes(1, 2, 3), { "9": 0.25 })]));
  it("reflects the position through the plane on its Dirichlet axes", () => {
    expect(result.orientifold?.images[0]).toEqual(expect.objectContaining({ id: "a'", position: { "5": -0.5, "9": -0.75 }, onPlane: false }));
  });
  it("the aa' sector is twice the distance to the plane long, with the antisymmetric of U(3) at the vector level", () => {
    const sector = result.sectors.find((s) => s.pair[1] === "a'");
    expect(sector?.separation).toBeCloseTo(2 * Math.hypot(1, 0.5), 12);
    expect(row(result, ["a", "a'"], "NS", "1/2")?.projected).toEqual({ symmetric: "0", antisymmetric: "8" });
    // 2 orientations x 3 * 2 / 2 antisymmetric labels x 8 states.
    expect(row(result, ["a", "a'"], "NS", "1/2")?.withChanPaton).toBe(String(2 * 3 * 8));
    expect(result.gaugeGroup).toBe("U(3)");
  });
  it("on the plane, the aa and aa' vectors join into the adjoint: N^2 + N(N - 1) = N(2N - 1) (common practice)", () => {
    const onPlane = computeSpectrum(config("IIB", [stack("a", 3, axes(1, 2, 3))], [plane("O-", axes(1, 2, 3))]));
    const fixed = Number(row(onPlane, ["a", "a"], "NS", "1/2")?.withChanPaton);
    const off = Number(row(result, ["a", "a"], "NS", "1/2")?.withChanPaton) + Number(row(result, ["a", "a'"], "NS", "1/2")?.withChanPaton);
    expect(off).toBe(fixed);
  });
  it("a stack with nu' = 2 to the plane has an anti-image and its charge projected out (the plane maps C_6 to -C_6 for an O3; common practice)", () => {
    const mixed = computeSpectrum(config("IIB", [stack("d5", 1, axes(1, 2, 3, 4, 5), { "9": 1 })], [plane("O-", axes(1, 2, 3))]));
    expect(mixed.orientifold?.images[0]?.anti).toBe(true);
    expect(mixed.orientifold?.tadpoles.find((entry) => entry.p === 5)?.status).toBe("projected out");
  });
});

describe("orientifold: charges and validation", () => {
  it("Op- carries -2^(p-5) and Op+ +2^(p-5) (common practice, from memory)", () => {
    expect(formatRational(planeCharge({ type: "O-", worldvolume: all9 }))).toBe("-16");
    expect(formatRational(planeCharge({ type: "O-", worldvolume: axes(1, 2, 3) }))).toBe("-1/4");
    expect(formatRational(planeCharge({ type: "O+", worldvolume: axes(1, 2, 3, 4, 5) }))).toBe("1");
    expect(formatRational(planeCharge({ type: "O-", worldvolume: axes(1, 2, 3, 4, 5, 6) }))).toBe("-2");
  });
  it("an O3- charge of -1/4 cannot be cancelled by whole branes", () => {
    const result = computeSpectrum(config("IIB", [], [plane("O-", axes(1, 2, 3))]));
    expect(result.orientifold?.tadpoles[0]?.toCancel).toMatch(/No whole number/);
  });
  it("rejects planes in format 1, a second plane, the wrong p parity, a taken id and a bad type, each at its JSON path", () => {
    const base = config("IIB", [stack("o2", 1, axes(1))], [plane("O-", axes(1, 2, 3))]);
    expect(checkConfiguration({ ...base, format: 1 }).map((p) => p.path)).toEqual([["orientifolds"]]);
    expect(checkConfiguration({ ...base, orientifolds: [plane("O-", axes(1)), { ...plane("O+", axes(1)), id: "p" }] })[0]?.path).toEqual(["orientifolds"]);
    expect(checkConfiguration({ ...base, orientifolds: [plane("O-", axes(1, 2))] })[0]?.path).toEqual(["orientifolds", 0, "worldvolume"]);
    expect(checkConfiguration({ ...base, orientifolds: [{ ...plane("O-", axes(1)), id: "o2" }] })[0]?.path).toEqual(["orientifolds", 0, "id"]);
    expect(checkConfiguration({ ...base, orientifolds: [{ ...plane("O-", axes(1)), type: "O" as "O-" }] })[0]?.path).toEqual(["orientifolds", 0, "type"]);
    expect(checkConfiguration({ ...base, orientifolds: [plane("O-", axes(1), { "1": 2 })] })[0]?.path).toEqual(["orientifolds", 0, "position", "1"]);
  });
  it("refuses a plane together with compact axes (a second fixed plane and reversed Wilson lines are not modelled)", () => {
    const base = config("IIB", [stack("d3", 1, axes(1, 2, 3))], [plane("O-", axes(1, 2, 3))]);
    expect(checkConfiguration(base)).toEqual([]);
    const problems = checkConfiguration({ ...base, compact: { "9": 2 } });
    expect(problems.map((p) => p.path)).toEqual([["orientifolds"]]);
    expect(problems[0]?.message).toContain("x9");
  });
  it("a plane preserves the supersymmetry of a brane along it: D3 on an O3 keeps 16 supercharges", () => {
    expect(computeSpectrum(config("IIB", [stack("d3", 1, axes(1, 2, 3))], [plane("O-", axes(1, 2, 3))])).supercharges).toBe(16);
  });
});
