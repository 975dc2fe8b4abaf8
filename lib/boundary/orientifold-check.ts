/**
 * Validation of the orientifold planes of a configuration (file format 2), each problem at its JSON
 * path: the format, at most one plane, ids unique among stacks and planes, the type, the worldvolume
 * (same axis rules and p parity as a stack: IIA even p, IIB odd p) and the positions.
 *
 * Invalid-input policy: never throws for a value of type `Configuration`; defensive about values that
 * only pretend to be one.
 */

import { checkPositions, checkWorldvolume, configurationLimits, type ConfigurationProblem } from "./check";
import type { Configuration } from "./types";

/**
 * Most planes a configuration may hold: two reflections along a common axis generate a lattice of
 * images (infinitely many on non-compact axes).
 *
 * @example
 * maxOrientifolds // => 1
 */
export const maxOrientifolds = 1;

/**
 * Adds every problem of `config.orientifolds` to `problems`.
 *
 * @param config - The configuration (not mutated).
 * @param dimension - Its spacetime dimension.
 * @param problems - Collected problems; appended to.
 * @example
 * const problems = []; checkOrientifolds({ ...config, format: 1, orientifolds: [plane] }, 10, problems);
 * problems[0]?.path // => ["orientifolds"]
 */
export function checkOrientifolds(config: Configuration, dimension: number, problems: ConfigurationProblem[]): void {
  const planes = config.orientifolds;
  if (planes === undefined) return;
  if (config.format !== 2) {
    problems.push({ path: ["orientifolds"], message: "Orientifold planes need file format 2; set format to 2." });
  }
  if (planes.length > maxOrientifolds) {
    problems.push({
      path: ["orientifolds"],
      message: `At most ${maxOrientifolds} orientifold plane is supported: two reflections would generate an endless lattice of images on non-compact axes.`,
    });
  }
  // A plane transverse to a circle comes with a second fixed plane at pi R, and images reverse
  // Wilson lines: neither is modelled, so the two features are not combined rather than combined wrongly.
  const compactAxes = Object.keys(config.compact ?? {});
  if (planes.length > 0 && compactAxes.length > 0) {
    problems.push({
      path: ["orientifolds"],
      message: `Orientifold planes are computed on non-compact axes only; this configuration makes x${compactAxes.join(", x")} compact. Remove the plane or the compact axes.`,
    });
  }
  const stackIds = new Set(config.stacks.map((stack) => stack.id));
  const seen = new Set<string>();
  planes.forEach((plane, index) => {
    const at = (...rest: (string | number)[]): (string | number)[] => ["orientifolds", index, ...rest];
    const name = `plane "${plane.id}"`;
    if (!/^[A-Za-z0-9_-]+$/.test(plane.id) || plane.id.length > configurationLimits.maxIdLength) {
      problems.push({ path: at("id"), message: `Plane id "${plane.id}" must be 1 to ${configurationLimits.maxIdLength} letters, digits, "-" or "_"` });
    } else if (stackIds.has(plane.id) || seen.has(plane.id)) {
      problems.push({ path: at("id"), message: `Plane id "${plane.id}" is already used; ids must be unique among stacks and planes` });
    }
    seen.add(plane.id);
    if (plane.type !== "O-" && plane.type !== "O+") {
      problems.push({ path: at("type"), message: `The type of ${name} must be "O-" or "O+", got ${String(plane.type)}` });
    }
    const axesOk = checkWorldvolume(plane, name, dimension, at, problems);
    if (axesOk && config.theory !== "bosonic") {
      const p = plane.worldvolume.length;
      const wantEven = config.theory === "IIA";
      if ((p % 2 === 0) !== wantEven) {
        problems.push({
          path: at("worldvolume"),
          message: wantEven
            ? `Plane "${plane.id}" is an O${p} plane, but IIA allows only even p (O0, O2, O4, O6, O8)`
            : `Plane "${plane.id}" is an O${p} plane, but IIB allows only odd p (O1, O3, O5, O7, O9)`,
        });
      }
    }
    checkPositions(plane, name, dimension, at, problems);
  });
}
