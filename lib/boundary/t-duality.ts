/**
 * T-duality along one compact axis, as an action on a configuration (issue 9).
 *
 * T_k maps the radius R_k to R'_k = 1 / R_k (alpha' = 1), flips Neumann and Dirichlet on axis k for
 * every stack (a Dp becomes a D(p - 1) or a D(p + 1)), turns a Wilson line theta into the position
 * x = theta R'_k on the dual circle and a position x into the Wilson line theta = x / R_k (x read
 * modulo 2 pi R_k), and exchanges IIA and IIB; the bosonic theory stays bosonic (Polchinski vol. 1,
 * sections 8.6-8.7, from memory). The open-string spectrum is unchanged state by state, with the
 * momentum n on axis k becoming the winding w = n and back.
 */

import { compactRadius, turnsOnCircle } from "./compact";
import type { Configuration, Stack, Theory } from "./types";

const twoPi = 2 * Math.PI;

/**
 * The T-dual of a configuration along one compact axis.
 *
 * @param configuration - A configuration (not mutated) in which `axis` is compact.
 * @param axis - The spatial axis to dualise.
 * @returns A new configuration of format 2: R -> 1/R on `axis`, N <-> D there for every stack,
 *   Wilson lines and positions exchanged (a zero Wilson line or position is left out), IIA <-> IIB.
 *   Applying it twice gives back the configuration, with positions on `axis` read modulo 2 pi R.
 * @throws RangeError when `axis` is not a compact axis of the configuration.
 * @example
 * tDualize({ ...config, theory: "IIA", compact: { "9": 2 }, stacks: [d0At(9, 0)] }, 9).stacks[0].worldvolume // => [9]
 */
export function tDualize(configuration: Configuration, axis: number): Configuration {
  const radius = compactRadius(configuration, axis);
  if (radius === null) throw new RangeError(`Axis ${axis} is not compact, so it has no T-dual`);
  const dualRadius = 1 / radius;
  const key = String(axis);
  const stacks = configuration.stacks.map((stack): Stack => {
    const neumann = stack.worldvolume.includes(axis);
    const { [key]: theta, ...otherWilson } = stack.wilson ?? {};
    const { [key]: x, ...otherPositions } = stack.position;
    const dual: Stack = { ...stack };
    if (neumann) {
      dual.worldvolume = stack.worldvolume.filter((entry) => entry !== axis);
      const position = turnsOnCircle(theta ?? 0, twoPi) * twoPi * dualRadius;
      dual.position = position === 0 ? otherPositions : { ...otherPositions, [key]: position };
      setWilson(dual, otherWilson);
    } else {
      dual.worldvolume = [...stack.worldvolume, axis].sort((left, right) => left - right);
      dual.position = otherPositions;
      const angle = turnsOnCircle(x ?? 0, twoPi * radius) * twoPi;
      setWilson(dual, angle === 0 ? otherWilson : { ...otherWilson, [key]: angle });
    }
    return dual;
  });
  return {
    ...configuration,
    format: 2,
    theory: dualTheory(configuration.theory),
    compact: { ...configuration.compact, [key]: dualRadius },
    stacks,
  };
}

/**
 * The theory T-dual to another along one axis.
 *
 * @param theory - bosonic, IIA or IIB.
 * @returns IIB for IIA, IIA for IIB, bosonic for bosonic.
 * @example
 * dualTheory("IIA") // => "IIB"
 */
export function dualTheory(theory: Theory): Theory {
  return theory === "IIA" ? "IIB" : theory === "IIB" ? "IIA" : "bosonic";
}

function setWilson(stack: Stack, wilson: Record<string, number>): void {
  if (Object.keys(wilson).length > 0) stack.wilson = wilson;
  else delete stack.wilson;
}
