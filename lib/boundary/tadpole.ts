/**
 * RR charge balance (tadpoles) of stacks and orientifold planes, per p.
 *
 * Charges in units of one physical Dp brane (a brane and its image count once): a brane +1, an
 * antibrane -1, an Op- plane -2^(p-5) and an Op+ plane +2^(p-5) (common practice, from memory:
 * Polchinski vol. 2, section 13.2; in the covering space, where images count separately, the plane
 * carries -2^(p-4)). So 16 D9 branes on an O9- plane (32 with their images) cancel it: type I with
 * SO(32). A stack with nu' = 2 mod 4 to the plane has its charge projected out (its image is an
 * antibrane).
 *
 * Status: a non-zero net charge of p = 9 fills space and has nowhere to go: an uncancelled tadpole,
 * an inconsistent theory. For p < 9 with non-compact transverse axes the flux escapes to infinity
 * (consistent, reported as "net charge"); a compact transverse space would make it a tadpole too.
 *
 * Invalid-input policy: assumes a configuration that `checkConfiguration` passed; only type II has
 * RR charges (the bosonic theory gets no entries).
 */

import { addRational, formatRational, isIntegerRational, isZeroRational, negateRational, rational, rationalToNumber, type Rational } from "./rational";
import type { OrientifoldPlane, Stack, TadpoleEntry, Theory } from "./types";

/**
 * RR charge of an orientifold plane in units of one physical Dp brane.
 *
 * @param plane - Only `type` and the length of `worldvolume` (p) are read.
 * @returns -2^(p-5) for O-, +2^(p-5) for O+, exact.
 * @example
 * formatRational(planeCharge({ type: "O-", worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9] })) // => "-16"
 * formatRational(planeCharge({ type: "O-", worldvolume: [1, 2, 3] }))                   // => "-1/4"
 */
export function planeCharge(plane: Pick<OrientifoldPlane, "type" | "worldvolume">): Rational {
  const p = plane.worldvolume.length;
  const magnitude = p >= 5 ? rational(2 ** (p - 5)) : rational(1, 2 ** (5 - p));
  return plane.type === "O-" ? negateRational(magnitude) : magnitude;
}

/**
 * The tadpole balance of every p that has a plane, a D9 stack, or a stack of the plane's kind.
 *
 * @param stacks - The stacks.
 * @param planes - The planes (at most one is allowed by `checkConfiguration`).
 * @param theory - Type II only; the bosonic theory returns [].
 * @param projectedOut - Ids of stacks whose charge the plane removes (nu' = 2 mod 4).
 * @returns Entries in increasing p.
 * @example
 * tadpoleBalance([sixteenD9], [o9minus], "IIB", new Set())[0]?.status // => "cancelled"
 */
export function tadpoleBalance(
  stacks: readonly Stack[],
  planes: readonly OrientifoldPlane[],
  theory: Theory,
  projectedOut: ReadonlySet<string>,
): TadpoleEntry[] {
  if (theory === "bosonic") return [];
  const ps = new Set<number>();
  for (const plane of planes) ps.add(plane.worldvolume.length);
  for (const stack of stacks) if (stack.worldvolume.length === 9 || planes.length > 0) ps.add(stack.worldvolume.length);
  return [...ps]
    .sort((x, y) => x - y)
    .map((p) => {
      const ofP = stacks.filter((stack) => stack.worldvolume.length === p);
      const counted = ofP.filter((stack) => !projectedOut.has(stack.id));
      const stackCharge = counted.reduce((sum, stack) => addRational(sum, rational(stack.anti ? -stack.count : stack.count)), rational(0));
      const planeTotal = planes
        .filter((plane) => plane.worldvolume.length === p)
        .reduce((sum, plane) => addRational(sum, planeCharge(plane)), rational(0));
      const net = addRational(stackCharge, planeTotal);
      const texts = { p, stacks: formatRational(stackCharge), planes: formatRational(planeTotal), net: formatRational(net) };
      if (counted.length === 0 && ofP.length > 0 && isZeroRational(planeTotal)) {
        return {
          ...texts,
          status: "projected out",
          message: `D${p} charge is projected out by the plane (each D${p} stack's image is an antibrane), so it needs no cancelling.`,
          toCancel: null,
        };
      }
      const balance = `D${p} charge: stacks ${texts.stacks}, planes ${texts.planes}, net ${texts.net} (units of one D${p} brane with its image)`;
      if (isZeroRational(net)) return { ...texts, status: "cancelled", message: `${balance}: cancelled.`, toCancel: null };
      return {
        ...texts,
        status: p === 9 ? "tadpole" : "net charge",
        message:
          p === 9
            ? `${balance}: the RR tadpole is not cancelled, and a space-filling charge has nowhere to go, so the theory is inconsistent.`
            : `${balance}: not cancelled; with non-compact transverse axes the flux escapes to infinity, on a compact transverse space it would be a tadpole.`,
        toCancel: cancellingMove(net, p),
      };
    });
}

/** What would cancel a net charge: whole branes or antibranes, or why whole branes cannot. */
function cancellingMove(net: Rational, p: number): string {
  if (!isIntegerRational(net)) {
    return `No whole number of D${p} branes cancels a net charge of ${formatRational(net)}: change the type of the plane or remove it.`;
  }
  const value = rationalToNumber(net);
  const count = Math.abs(value);
  const kind = value < 0 ? `D${p} brane${count === 1 ? "" : "s"}` : `anti-D${p} brane${count === 1 ? "" : "s"}`;
  return `Add ${count} ${kind} (each with its image), or remove ${count} ${value < 0 ? "anti-" : ""}D${p} brane${count === 1 ? "" : "s"}.`;
}
