import { create, all, type BigNumber } from "mathjs";
import { describe, expect, it } from "vitest";
import { annulusCurve, braneAntibraneSupergravity, createAnnulusCache } from "./annulus";

/** The 40-digit reference takes seconds on a loaded machine: a generous limit, not a speed check. */
const referenceTimeoutMs = 120_000;

const shapes = [0, 2, 4, 6, 8].flatMap((nu) => [true, false].map((sameOrientation) => ({ nu, sameOrientation })));

describe("annulus: Jacobi's identity (theta_3^4 = theta_2^4 + theta_4^4, Whittaker and Watson section 21.3, from memory)", () => {
  it("V(y) = 0 identically for nu = 0 stacks of the same orientation, at every separation and p", () => {
    for (const nn of [0, 3, 6, 9]) {
      const curve = annulusCurve({ nu: 0, nn, sameOrientation: true });
      expect(curve.vanishes).toBe(true);
      for (const t of [0.05, 0.3, 1, 2.5]) expect(curve.partition(t)).toBe(0);
      for (const y of [0.1, 1, 4.4, 17]) expect(curve.potential(y)).toBe(0);
    }
  });

  it("V(y) = 0 identically for nu = 4, whatever the orientations (NS and R agree level by level, physics.md)", () => {
    for (const sameOrientation of [true, false]) {
      const curve = annulusCurve({ nu: 4, nn: 2, sameOrientation });
      expect(curve.vanishes).toBe(true);
      expect(curve.potential(2)).toBe(0);
    }
  });

  it("nu = 8 gives Z(t) = -1 exactly (Jacobi again: f3^8 - f2^8 = f4^8), the constant force of string creation", () => {
    const curve = annulusCurve({ nu: 8, nn: 0, sameOrientation: true });
    for (const t of [0.1, 0.5, 1, 3]) expect(curve.partition(t)).toBeCloseTo(-1, 12);
    // dd = 1: only changes of V are finite (physics.md, "constant rather than zero").
    expect(curve.undefinedReason).toMatch(/\|y\|/);
    expect(curve.potential(1)).toBeNull();
  });

  it("brane-antibrane stacks at nu = 0 do interact: Z is not zero (the projection is not Jacobi-cancelled)", () => {
    const curve = annulusCurve({ nu: 0, nn: 3, sameOrientation: false });
    expect(curve.vanishes).toBe(false);
    // Closed channel C_0 = 2 * 16: NS-NS and R-R exchange add (Polchinski vol. 2, section 13.4, from memory).
    expect(curve.exchange).toBe(32);
  });
});

describe("annulus: the open and closed channels are one function (modular transformation, Polchinski vol. 1 section 7.4, from memory)", () => {
  it("the engine's GSO-projected level counts and the closed-channel products agree near t = 1 for every nu and orientation", () => {
    for (const { nu, sameOrientation } of shapes) {
      const curve = annulusCurve({ nu, nn: 0, sameOrientation });
      for (const t of [0.8, 1, 1.25]) {
        const open = curve.partition(t, "open");
        const closed = curve.partition(t, "closed");
        expect(Math.abs(open - closed)).toBeLessThanOrEqual(1e-11 * Math.max(1, Math.abs(open)));
      }
    }
  });

  it("the critical separations are those of the lightest surviving state: pi sqrt 2 (nu = 0 brane-antibrane) and pi (nu = 2)", () => {
    // y_c = 2 pi sqrt(-(N + a)): a = -1/2 and a = -1/4 (physics.md; Banks and Susskind 1995, from memory).
    expect(annulusCurve({ nu: 0, nn: 0, sameOrientation: false }).criticalSeparation).toBeCloseTo(Math.PI * Math.SQRT2, 12);
    expect(annulusCurve({ nu: 2, nn: 0, sameOrientation: true }).criticalSeparation).toBeCloseTo(Math.PI, 12);
    expect(annulusCurve({ nu: 6, nn: 0, sameOrientation: true }).criticalSeparation).toBeNull();
  });
});

describe("annulus: large-separation fall-off of the brane-antibrane potential (supergravity exchange)", () => {
  it("V(y) -> -pi (4 pi^2)^(3-p) Gamma((7-p)/2) pi^(-(9-p)/2) y^-(7-p) for p = 0..6 (Polchinski vol. 1 section 8.7, vol. 2 section 13.4, from memory)", () => {
    for (let p = 0; p <= 6; p += 1) {
      const curve = annulusCurve({ nu: 0, nn: p, sameOrientation: false });
      for (const y of [25, 40]) {
        const value = curve.potential(y) ?? Number.NaN;
        const gravity = braneAntibraneSupergravity(p, y);
        expect(Math.abs(value / gravity - 1)).toBeLessThan(1e-10);
      }
      // The fall-off exponent itself: doubling y divides V by 2^(7-p).
      const ratio = (curve.potential(30) ?? 0) / (curve.potential(60) ?? 1);
      expect(ratio).toBeCloseTo(2 ** (7 - p), 6);
    }
  });

  it("the D3 case in closed form: V = -1 / (pi^2 y^4) (supergravity value above at p = 3)", () => {
    expect(braneAntibraneSupergravity(3, 10)).toBeCloseTo(-1 / (Math.PI ** 2 * 1e4), 18);
  });

  it("attraction for nu = 2, repulsion for nu = 6 at large y (Polchinski vol. 2, section 13.4, from memory: the sign of the NS-NS minus R-R exchange)", () => {
    expect(annulusCurve({ nu: 2, nn: 0, sameOrientation: true }).potential(20)).toBeLessThan(0);
    expect(annulusCurve({ nu: 6, nn: 0, sameOrientation: true }).potential(20)).toBeGreaterThan(0);
  });
});

describe("annulus: the brane-antibrane tachyon at y -> y_c", () => {
  it("below y_c the integral diverges (no potential is returned), at and above it V is finite", () => {
    const curve = annulusCurve({ nu: 0, nn: 0, sameOrientation: false });
    const yc = curve.criticalSeparation ?? 0;
    expect(curve.potential(yc * 0.999)).toBeNull();
    expect(Number.isFinite(curve.potential(yc) ?? Number.NaN)).toBe(true);
  });

  it("for p = 0 the force diverges as (y - y_c)^(-1/2): V(y) - V(y_c) -> sqrt(eps / 2 pi), eps = (y^2 - y_c^2) / 2 pi", () => {
    // Derivation: near y_c the tachyon (one state per orientation) gives the large-t tail
    // -(1/2) 2 (8 pi^2)^(-1/2) integral dt t^(-3/2) (e^(-eps t) - 1) = -(8 pi^2)^(-1/2) Gamma(-1/2) sqrt(eps)
    // = sqrt(eps / 2 pi), with Gamma(-1/2) = -2 sqrt(pi) (DLMF 5.4.6 with 5.5.1), plus terms O(eps).
    const curve = annulusCurve({ nu: 0, nn: 0, sameOrientation: false });
    const yc = curve.criticalSeparation ?? 0;
    const atCritical = curve.potential(yc) ?? Number.NaN;
    const ratios = [1e-4, 1e-6, 1e-8].map((delta) => {
      const y = yc * (1 + delta);
      const eps = (y * y - yc * yc) / (2 * Math.PI);
      return ((curve.potential(y) ?? Number.NaN) - atCritical) / Math.sqrt(eps / (2 * Math.PI));
    });
    expect(Math.abs((ratios[2] ?? 0) - 1)).toBeLessThan(1e-3);
    // The correction shrinks like sqrt(eps): the ratio converges to 1.
    expect(Math.abs((ratios[2] ?? 0) - 1)).toBeLessThan(Math.abs((ratios[0] ?? 0) - 1));
  });
});

describe("annulus: numerics against a 40-digit evaluation (mathjs BigNumber, tanh-sinh and exp-sinh quadrature)", () => {
  const cases = [
    { nu: 0, nn: 3, sameOrientation: false, y: 6 },
    { nu: 0, nn: 0, sameOrientation: false, y: 5 },
    { nu: 2, nn: 0, sameOrientation: true, y: 3.5 },
    { nu: 2, nn: 4, sameOrientation: false, y: 7 },
    { nu: 6, nn: 0, sameOrientation: true, y: 1.5 },
    { nu: 6, nn: 0, sameOrientation: false, y: 2.5 },
  ];
  it("the reference quadrature has converged (halving its step changes nothing at 1e-14)", () => {
    const coarse = referencePotential({ nu: 0, nn: 3, sameOrientation: false }, 6, 1 / 8);
    const fine = referencePotential({ nu: 0, nn: 3, sameOrientation: false }, 6, 1 / 16);
    expect(Math.abs(coarse / fine - 1)).toBeLessThan(1e-14);
  }, referenceTimeoutMs);
  it.each(cases)("nu = $nu, nn = $nn, same orientation $sameOrientation, y = $y: relative error below 1e-8", ({ y, ...shape }) => {
    const engine = createAnnulusCache()(shape).potential(y) ?? Number.NaN;
    const reference = referencePotential(shape, y, 1 / 16);
    expect(Math.abs(engine / reference - 1)).toBeLessThan(1e-8);
  }, referenceTimeoutMs);
});

// ---- The 40-digit reference: products of f1..f4 straight from their definitions (Polchinski vol. 2,
// section 13.4, from memory), the closed channel by naive polynomial expansion, and double-exponential
// quadrature (Takahasi and Mori 1974). Independent of the engine's series and grid.
const big = create(all as NonNullable<typeof all>, { number: "BigNumber", precision: 40 });
const b = (value: number | string): BigNumber => big.bignumber(value) as BigNumber;
const pi = big.pi as unknown as BigNumber;

function products(q: BigNumber): { p1: BigNumber; p2: BigNumber; p3: BigNumber; p4: BigNumber } {
  let p1 = b(1);
  let p2 = b(1);
  let p3 = b(1);
  let p4 = b(1);
  const root = q.sqrt();
  let integer = q;
  let half = root;
  const tiny = b("1e-45");
  while (half.greaterThan(tiny)) {
    p1 = p1.times(b(1).minus(integer));
    p2 = p2.times(b(1).plus(integer));
    p3 = p3.times(b(1).plus(half));
    p4 = p4.times(b(1).minus(half));
    integer = integer.times(q);
    half = half.times(q);
  }
  return { p1, p2, p3, p4 };
}

/** Z(t) in the open channel from f1 = q^(1/24) P1, f2 = sqrt2 q^(1/24) P2, f3 = q^(-1/48) P3, f4 = q^(-1/48) P4. */
function openReference(nu: number, same: boolean, t: BigNumber): BigNumber {
  const q = t.times(pi).times(-2).exp();
  const { p1, p2, p3, p4 } = products(q);
  const f1 = q.pow(b(1).div(24)).times(p1);
  const f2 = b(2).sqrt().times(q.pow(b(1).div(24))).times(p2);
  const f3 = q.pow(b(-1).div(48)).times(p3);
  const f4 = q.pow(b(-1).div(48)).times(p4);
  const denominator = f1.pow(8 - nu).times(f4.pow(nu));
  const ns = f3.pow(8 - nu).times(f2.pow(nu)).div(denominator);
  const r = f2.pow(8 - nu).times(f3.pow(nu)).div(denominator);
  const nsF = nu === 0 ? f4.pow(8).div(f1.pow(8)) : b(0);
  return ns.minus(r).minus(nsF.times(same ? 1 : -1));
}

/** Polynomials in x with BigInt coefficients, truncated at degree 14, multiplied naively. */
const degree = 14;
function multiply(a: bigint[], c: bigint[]): bigint[] {
  const out = new Array<bigint>(degree + 1).fill(0n);
  for (let i = 0; i <= degree; i += 1) for (let j = 0; i + j <= degree; j += 1) out[i + j] = (out[i + j] ?? 0n) + (a[i] ?? 0n) * (c[j] ?? 0n);
  return out;
}
/** (1 + sign x^k)^exponent, exponent a small integer; a negative one as a geometric series. */
function factor(k: number, sign: 1 | -1, exponent: number): bigint[] {
  let out = [1n, ...new Array<bigint>(degree).fill(0n)];
  const one = new Array<bigint>(degree + 1).fill(0n);
  one[0] = 1n;
  if (exponent > 0) {
    one[k] = BigInt(sign);
  } else {
    for (let j = 1; j * k <= degree; j += 1) one[j * k] = sign === -1 ? 1n : j % 2 === 0 ? 1n : -1n;
  }
  for (let e = 0; e < Math.abs(exponent); e += 1) out = multiply(out, one);
  return out;
}
function closedPolynomials(nu: number): { difference: bigint[]; ratio: bigint[] } {
  let p3p4 = [1n, ...new Array<bigint>(degree).fill(0n)];
  let p4p3 = [...p3p4];
  let denominator = [...p3p4];
  let ratio = [...p3p4];
  for (let n = 1; 2 * n - 1 <= degree; n += 1) {
    p3p4 = multiply(multiply(p3p4, factor(2 * n - 1, 1, 8 - nu)), factor(2 * n - 1, -1, nu));
    p4p3 = multiply(multiply(p4p3, factor(2 * n - 1, -1, 8 - nu)), factor(2 * n - 1, 1, nu));
  }
  for (let n = 1; 2 * n <= degree; n += 1) {
    denominator = multiply(multiply(denominator, factor(2 * n, -1, -(8 - nu))), factor(2 * n, 1, -nu));
    ratio = multiply(multiply(ratio, factor(2 * n, 1, 8)), factor(2 * n, -1, -8));
  }
  const difference = multiply(
    p3p4.map((value, index) => value - (p4p3[index] ?? 0n)),
    denominator,
  );
  return { difference, ratio };
}

/** Z(t) in the closed channel: t^((8-nu)/2) [x^-1 2^(-nu/2) (P3^(8-nu) P4^nu - P4^(8-nu) P3^nu) / (P1^(8-nu) P2^nu) - s 16 P2^8 / P1^8], x = e^(-pi/t). */
function closedReference(nu: number, same: boolean, t: BigNumber, polys: { difference: bigint[]; ratio: bigint[] }): BigNumber {
  const x = pi.div(t).neg().exp();
  const evaluate = (coefficients: bigint[]): BigNumber => {
    let sum = b(0);
    for (let k = coefficients.length - 1; k >= 0; k -= 1) sum = sum.times(x).plus(b((coefficients[k] ?? 0n).toString()));
    return sum;
  };
  // The difference is odd in x: divide by x exactly by shifting the coefficients.
  const shifted = polys.difference.slice(1);
  let value = evaluate(shifted).div(b(2).pow(nu / 2));
  if (nu === 0) value = value.minus(evaluate(polys.ratio).times(16).times(same ? 1 : -1));
  return t.pow((8 - nu) / 2).times(value);
}

function referencePotential(shape: { nu: number; nn: number; sameOrientation: boolean }, y: number, h: number): number {
  const { nu, nn, sameOrientation } = shape;
  const split = b("0.25");
  const stretch = b(y).pow(2).div(pi.times(2));
  const polys = closedPolynomials(nu);
  const integrand = (t: BigNumber, z: BigNumber): BigNumber => t.pow(-(nn + 3) / 2).times(t.times(stretch).neg().exp()).times(z);
  let closedPart = b(0);
  let openPart = b(0);
  for (let s = -4.5; s <= 4.5 + 1e-12; s += h) {
    const sinh = b(s).sinh().times(pi);
    const cosh = b(s).cosh().times(pi);
    // tanh-sinh on (0, split): t = split / (1 + e^(-pi sinh s)).
    const e = sinh.neg().exp();
    const t = split.div(b(1).plus(e));
    const dt = split.times(cosh).times(e).div(b(1).plus(e).pow(2));
    if (t.greaterThan(0)) closedPart = closedPart.plus(integrand(t, closedReference(nu, sameOrientation, t, polys)).times(dt));
    // exp-sinh on (split, inf): t = split + e^((pi/2) sinh s).
    const grow = sinh.div(2).exp();
    const tOpen = split.plus(grow);
    // Every test case has (y^2 - y_c^2) / 2 pi > 0.35, so beyond t = 2000 the integrand is below e^-700.
    if (tOpen.greaterThan(2000)) continue;
    const dtOpen = cosh.div(2).times(grow);
    openPart = openPart.plus(integrand(tOpen, openReference(nu, sameOrientation, tOpen)).times(dtOpen));
  }
  const total = closedPart.plus(openPart).times(h);
  const prefactor = b(8).times(pi.pow(2)).pow(-(nn + 1) / 2).times(-0.5);
  return prefactor.times(total).toNumber();
}
