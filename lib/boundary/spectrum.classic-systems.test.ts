import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { configurationCost } from "./check";
import { oscillatorDegeneracies, projectedDegeneracies } from "./degeneracy";
import { lightConeAxis } from "./expansion";
import { addRational, compareRational, parseRational, rational } from "./rational";
import { computeSpectrum } from "./spectrum";
import type { Configuration, Sector, SectorKind, Stack } from "./types";

// The classic systems (D0-D4, D0-D8, D1-D5, D1-D9, D3-D7, brane-antibrane, coincident and separated
// stacks) read the way a researcher reads them: the mass cap, the notes, the low-dimensional
// content and the named multiplets.

const axes = (from: number, to: number): number[] => Array.from({ length: to - from + 1 }, (_, i) => from + i);

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function config(theory: Configuration["theory"], stacks: Stack[], extra: Partial<Configuration> = {}): Configuration {
  return { format: 1, title: "classic", theory, stringScaleGeV: null, levels: 2, stacks, ...extra };
}

function sectorOf(configuration: Configuration, a: string, b: string): Sector {
  const found = computeSpectrum(configuration).sectors.find((sector) => sector.pair[0] === a && sector.pair[1] === b);
  if (!found) throw new Error(`no sector ${a}-${b}`);
  return found;
}

/** N + a of a row, exact, from its level and the sector's zero point. */
function unstretched(sector: Sector, kind: SectorKind, level: string) {
  return addRational(parseRational(level), parseRational(sector.zeroPoint[kind] ?? "0"));
}

/** The highest alpha' M^2 at zero separation listed in one sector kind. */
function topOf(sector: Sector, kind: SectorKind): string | undefined {
  return sector.levels.filter((row) => row.sector === kind).at(-1)?.massSquared;
}

describe("the mass cap (levels)", () => {
  it("stops NS and R at the same alpha' M^2: with levels 2 both reach 2, where R used to reach 2 and NS 1", () => {
    // alpha' M^2 = N + a at y = 0 (physics.md, mass formula); a_NS = -1/2, a_R = 0 at nu = 0 (Polchinski vol. 2, 13.4, from memory).
    const d3 = sectorOf(config("IIB", [stack("d3", [1, 2, 3])]), "d3", "d3");
    expect(topOf(d3, "NS")).toBe("2");
    expect(topOf(d3, "R")).toBe("2");
    expect(d3.levels.filter((row) => row.sector === "NS").map((row) => row.level)).toEqual(["1/2", "3/2", "5/2"]);
    // nu = 8 (a_NS = 1/2): NS stops at N = 3/2 and R at N = 2, both at alpha' M^2 = 2.
    const d0d8 = sectorOf(config("IIA", [stack("d8", axes(1, 8)), stack("d0", [])]), "d0", "d8");
    expect(topOf(d0d8, "NS")).toBe("2");
    expect(topOf(d0d8, "R")).toBe("2");
    // Bosonic a = -1: N runs to 3 (alpha' M^2 = 2), with 3200 states there (OEIS A005758).
    const bosonic = sectorOf(config("bosonic", [stack("d3", [1, 2, 3])]), "d3", "d3");
    expect(bosonic.levels.at(-1)).toEqual(expect.objectContaining({ level: "3", massSquared: "2", states: "3200" }));
  });

  it("lists exactly the surviving levels with N + a <= levels in every sector, separated or not", () => {
    // The cut is on N + a (the stretching adds the same (y / 2 pi)^2 to every row); the rows must be the
    // complete list of levels with states up to it (physics.md, mass formula).
    const theories = fc.constantFrom<[Configuration["theory"], number[][]]>(
      ["IIA", [[], [1, 2], axes(1, 4), axes(1, 6), axes(1, 8), [3, 4, 5, 6]]],
      ["IIB", [[1], [1, 2, 3], axes(1, 5), axes(1, 7), axes(1, 9), [4, 5, 6]]],
      ["bosonic", [[], [1, 2], axes(1, 12), axes(1, 25)]],
    );
    fc.assert(
      fc.property(
        theories.chain(([theory, shapes]) =>
          fc.tuple(
            fc.constant(theory),
            fc.array(fc.record({ shape: fc.nat(shapes.length - 1), anti: fc.boolean(), y: fc.constantFrom(0, 1.5) }), { minLength: 1, maxLength: 3 }),
            fc.integer({ min: 0, max: 4 }),
            fc.constant(shapes),
          ),
        ),
        ([theory, picks, levels, shapes]) => {
          const stacks = picks.map((pick, index) =>
            stack(`s${index}`, shapes[pick.shape] as number[], {
              anti: pick.anti,
              position: (shapes[pick.shape] as number[]).includes(index + 2) ? {} : { [String(index + 2)]: pick.y },
            }),
          );
          const result = computeSpectrum(config(theory, stacks, { levels }));
          const cap = rational(levels);
          for (const sector of result.sectors) {
            const a = stacks.find((s) => s.id === sector.pair[0]);
            const b = stacks.find((s) => s.id === sector.pair[1]);
            const same = theory === "bosonic" || a?.anti === b?.anti;
            for (const kind of theory === "bosonic" ? (["bosonic"] as const) : (["NS", "R"] as const)) {
              const listed = sector.levels.filter((row) => row.sector === kind).map((row) => row.level);
              for (const level of listed) expect(compareRational(unstretched(sector, kind, level), cap)).toBeLessThanOrEqual(0);
              const a0 = parseRational(sector.zeroPoint[kind] ?? "0");
              const counted =
                kind === "bosonic"
                  ? oscillatorDegeneracies("bosonic", { dimension: 26, nu: sector.nu, maxLevel: levels + 2 }).flatMap((count, k) =>
                      count !== 0n ? [k] : [],
                    )
                  : projectedDegeneracies(kind, { nu: sector.nu, sameOrientation: same, maxLevel: levels + 2 }).map((row) => row.twiceLevel);
              const expected = counted
                .filter((k) => compareRational(addRational(rational(k, 2), a0), cap) <= 0)
                .map((k) => (k % 2 === 0 ? String(k / 2) : `${k}/2`));
              expect(listed).toEqual(expected);
            }
          }
        },
      ),
      { numRuns: 40 },
    );
  });

  it("never lists more than four rows per unit of configurationCost", () => {
    // The bound stated with configurationCost: NS and R each hold at most 2 levels + 2 rows (a >= -1/2),
    // bosonic at most 2 levels + 3 (a >= -1); hand-derived from the zero-point formulas of physics.md.
    fc.assert(
      fc.property(
        fc.constantFrom<Configuration["theory"]>("IIA", "bosonic"),
        fc.integer({ min: 0, max: 12 }),
        fc.array(fc.constantFrom([], [1, 2], axes(1, 4), axes(1, 8)), { minLength: 1, maxLength: 4 }),
        (theory, levels, shapes) => {
          const configuration = config(theory, shapes.map((shape, index) => stack(`s${index}`, shape)), { levels });
          const rows = computeSpectrum(configuration).sectors.reduce((sum, sector) => sum + sector.levels.length, 0);
          expect(rows).toBeLessThanOrEqual(4 * configurationCost(configuration));
        },
      ),
      { numRuns: 30 },
    );
  });
});

describe("nu = 8 notes and states (D0-D8, D1-D9)", () => {
  it("says for D0-D8 that the force is constant without a stretched string and supersymmetric with one", () => {
    // String creation: Bachas, Green and Schwimmer 1997; Danielsson, Ferretti and Klebanov 1997 (from memory).
    const pair = sectorOf(config("IIA", [stack("d8", axes(1, 8)), stack("d0", [], { position: { "9": 2 } })]), "d0", "d8");
    const note = pair.notes.find((text) => text.startsWith("nu = 8"));
    expect(note).toContain("Without a fundamental string stretched between the stacks they feel a constant force");
    expect(note).toContain("with one (such a string is created when the stacks cross) the configuration is supersymmetric");
    expect(note).not.toContain("so the force is constant rather than zero");
  });

  it("calls the massless D0-D8 state a fermionic mode in 0+1 dimensions, not a chiral fermion", () => {
    // A single real fermion zero mode on a line: no chirality in 0+1 dimensions (common practice).
    const pair = sectorOf(config("IIA", [stack("d8", axes(1, 8)), stack("d0", [])]), "d0", "d8");
    expect(pair.massless).toEqual([expect.objectContaining({ sector: "R", states: "1" })]);
    expect(pair.massless[0]?.description).toMatch(/^1 fermionic mode in 0\+1 dimensions/);
    expect(pair.massless[0]?.description).not.toContain("chiral");
  });

  it("gives D1-D9, which share no Dirichlet axis, no force note and a chiral fermion in 1+1 dimensions", () => {
    // With no common Dirichlet axis the stacks cannot be separated, so no force applies (issue statement, common practice).
    const pair = sectorOf(config("IIB", [stack("d1", [1]), stack("d9", axes(1, 9))]), "d1", "d9");
    expect(pair.notes.some((text) => text.includes("force"))).toBe(false);
    expect(pair.massless[0]?.description).toMatch(/^1 chiral fermion state in 1\+1 dimensions/);
  });

  it("keeps the no-force statement at nu = 4 only where the stacks can be separated", () => {
    // D5 inside D9: nu = 4 and no common Dirichlet axis; D0-D4: nu = 4 along x5..x9 (Polchinski vol. 2, 13.4, from memory).
    const inside = sectorOf(config("IIB", [stack("d5", axes(1, 5)), stack("d9", axes(1, 9))]), "d5", "d9");
    expect(inside.notes).toContain("nu = 4: NS and R agree level by level.");
    const apart = sectorOf(config("IIA", [stack("d4", axes(1, 4)), stack("d0", [])]), "d0", "d4");
    expect(apart.notes).toContain("nu = 4: NS and R agree level by level; the pair feels no force.");
  });
});

describe("low-dimensional worldvolumes (D0, D1)", () => {
  it("describes D0 strings as 9 scalars, a non-dynamical A_0 and 16 real fermions, keeping the light-cone trace count of 8", () => {
    // 10d super Yang-Mills reduced to 0+1 dimensions (common practice); light-cone count D - 2 = 8 (physics.md).
    const [ns, r] = sectorOf(config("IIA", [stack("d0", [])]), "d0", "d0").massless;
    expect(ns?.description).toBe(
      "9 scalars (positions on DD axes 1-9) and a non-dynamical A_0 (no propagating polarisation; it imposes Gauss's law); light-cone trace count: 8 states",
    );
    expect(ns?.states).toBe("8");
    expect(r?.description).toContain("16 real fermions");
    expect(r?.description).toContain("light-cone trace count: 8 states");
  });

  it("describes the D1 gauge field as propagating nothing while carrying electric flux", () => {
    // In 1+1 dimensions F_01 has no propagating polarisation but a constant electric flux (common practice, from memory).
    const [ns] = sectorOf(config("IIB", [stack("d1", [1])]), "d1", "d1").massless;
    expect(ns?.description).toBe(
      "gauge field with no propagating degrees of freedom in 1+1 dimensions (it still carries electric flux) and 8 scalars (positions on DD axes 2-9); light-cone trace count: 8 states",
    );
  });
});

describe("bosonic pairs with every spatial axis ND (covariant count)", () => {
  /** prod (1 - q^n)^(+1) prod (1 - q^(n-1/2))^(-nu) in t = q^(1/2), by plain polynomial multiplication. */
  function naiveCovariant(nu: number, maxIndex: number): bigint[] {
    let series: bigint[] = [1n, ...new Array<bigint>(maxIndex).fill(0n)];
    const times = (factor: bigint[]) => {
      const out = new Array<bigint>(maxIndex + 1).fill(0n);
      for (let i = 0; i <= maxIndex; i += 1) for (let j = 0; i + j <= maxIndex; j += 1) out[i + j] = (out[i + j] ?? 0n) + (series[i] ?? 0n) * (factor[j] ?? 0n);
      series = out;
    };
    for (let power = 2; power <= maxIndex; power += 2) {
      const factor = new Array<bigint>(maxIndex + 1).fill(0n);
      factor[0] = 1n;
      factor[power] = -1n;
      times(factor);
    }
    for (let power = 1; power <= maxIndex; power += 2) {
      // 1 / (1 - t^m) = sum_k t^(m k), taken nu times.
      const geometric = new Array<bigint>(maxIndex + 1).fill(0n);
      for (let k = 0; k * power <= maxIndex; k += 1) geometric[k * power] = 1n;
      for (let copy = 0; copy < nu; copy += 1) times(geometric);
    }
    return series;
  }

  it("counts D25 with D0 covariantly: a = 9/16 and 1, 25, 324, 2925, 20774 states at N = 0 to 2", () => {
    // a = -1 + nu/16 and prod (1-q^n)^(+1) prod (1-q^(n-1/2))^(-25): Polchinski vol. 1, section 4.4 (from memory);
    // the numbers are checked here against a plain expansion of that product.
    const pair = sectorOf(config("bosonic", [stack("fill", axes(1, 25)), stack("point", [])], { levels: 3 }), "fill", "point");
    expect(pair.zeroPoint.bosonic).toBe("9/16");
    const expected = naiveCovariant(25, 4).map(String);
    expect(expected).toEqual(["1", "25", "324", "2925", "20774"]);
    expect(pair.levels.map((row) => row.states)).toEqual(expected);
    expect(pair.levels.map((row) => row.massSquared)).toEqual(["9/16", "17/16", "25/16", "33/16", "41/16"]);
    expect(pair.notes[0]).toContain("counted covariantly");
    expect(lightConeAxis(pair)).toBeNull();
  });

  it("agrees with the plain product in a non-critical dimension too", () => {
    // D = 6: a D5 with a D0 has nu = 5; a = -(D - 2)/24 + nu/16 = -1/6 + 5/16 = 7/48 (physics.md closed form).
    const pair = sectorOf(config("bosonic", [stack("fill", axes(1, 5)), stack("point", [])], { dimension: 6, levels: 3 }), "fill", "point");
    expect(pair.zeroPoint.bosonic).toBe("7/48");
    expect(pair.levels.map((row) => row.states)).toEqual(naiveCovariant(5, 5).filter((count) => count !== 0n).map(String));
  });
});

describe("W-boson multiplets of separated identical stacks", () => {
  it("names the short massive vector multiplet of two separated D3s: 3 + 5 bosonic and 8 fermionic states, M = y / (2 pi)", () => {
    // A massive vector in 4d has 3 polarisations and eats the scalar along the separation (common practice);
    // 8 + 8 = 16 = 2^(16/4) states is the short (1/2-BPS) multiplet of 16 supercharges (common practice, from memory).
    const pair = sectorOf(config("IIB", [stack("a", [1, 2, 3]), stack("b", [1, 2, 3], { position: { "9": 2 * Math.PI } })]), "a", "b");
    expect(pair.multiplet).toEqual({
      name: "massive W-boson vector multiplet (short, 16 supercharges)",
      dimension: 4,
      content: "one massive vector (3 polarisations), 5 scalars and 8 fermion states",
      states: "16",
      massSquared: "1",
      mass: 1,
    });
    expect(pair.notes[0]).toContain("form a massive W-boson vector multiplet");
  });

  it("gives separated D0s 8 scalars and 8 fermion states with no spin, and separated D8s a vector with 8 polarisations", () => {
    // Little group SO(p) of a massive particle in p + 1 dimensions (common practice).
    const d0 = sectorOf(config("IIA", [stack("a", []), stack("b", [], { position: { "9": 1 } })]), "a", "b");
    expect(d0.multiplet?.content).toBe("8 scalars and 8 fermion states (no spin in 0+1 dimensions)");
    const d8 = sectorOf(config("IIA", [stack("a", axes(1, 8)), stack("b", axes(1, 8), { position: { "9": 1 } })]), "a", "b");
    expect(d8.multiplet?.content).toBe("one massive vector (8 polarisations) and 8 fermion states");
  });

  it("gives separated bosonic D3s massive W bosons (3 polarisations and 21 scalars, 24 states) and no multiplet otherwise", () => {
    // 24 light-cone states at N = 1 (OEIS A005758): a massive vector in 4d (3) and 24 - 3 = 21 scalars.
    const bosonic = sectorOf(config("bosonic", [stack("a", [1, 2, 3]), stack("b", [1, 2, 3], { position: { "9": 1 } })]), "a", "b");
    expect(bosonic.multiplet).toEqual(expect.objectContaining({ name: "massive W bosons", content: "one massive vector (3 polarisations) and 21 scalars", states: "24" }));
    // Coincident, brane-antibrane or nu > 0 pairs have no W multiplet.
    expect(sectorOf(config("IIB", [stack("a", [1, 2, 3]), stack("b", [1, 2, 3])]), "a", "b").multiplet).toBeNull();
    expect(sectorOf(config("IIB", [stack("a", [1, 2, 3]), stack("b", [1, 2, 3], { anti: true, position: { "9": 1 } })]), "a", "b").multiplet).toBeNull();
    expect(sectorOf(config("IIB", [stack("a", [1, 2, 3]), stack("b", axes(1, 7), { position: { "9": 1 } })]), "a", "b").multiplet).toBeNull();
  });
});
