/**
 * Pure edits of the orientifold planes of a document (file format 2), used by the designer's named
 * commands like the stack edits in `document.ts`. Adding a plane sets format 2. At most one plane
 * (`maxOrientifolds`): adding another is refused (the document is returned unchanged).
 */
import { maxOrientifolds } from "@/lib/boundary/orientifold-check";
import type { Configuration, OrientifoldPlane, OrientifoldType } from "@/lib/boundary/types";

/** The default plane: along the first stack's worldvolume (so it is parallel to it), else along x1..x3 (IIB), x1, x2 (IIA) or x1. */
function defaultPlane(config: Configuration): OrientifoldPlane {
  const first = config.stacks[0];
  const worldvolume = first ? [...first.worldvolume] : config.theory === "IIB" ? [1, 2, 3] : config.theory === "IIA" ? [1, 2] : [1];
  const taken = new Set([...config.stacks.map((stack) => stack.id), ...(config.orientifolds ?? []).map((plane) => plane.id)]);
  let id = "o";
  for (let k = 2; taken.has(id); k += 1) id = `o${k}`;
  return { id, label: "", type: "O-", worldvolume, position: {} };
}

/**
 * Why no plane can be added, or null.
 *
 * @example
 * addPlaneProblem({ orientifolds: [] }) // => null
 */
export function addPlaneProblem(config: Pick<Configuration, "orientifolds">): string | null {
  return (config.orientifolds?.length ?? 0) >= maxOrientifolds
    ? `At most ${maxOrientifolds} orientifold plane: two would reflect into an endless lattice of images.`
    : null;
}

/** Adds an O- plane parallel to the first stack, through the origin; sets format 2. */
export function addPlane(config: Configuration): Configuration {
  if (addPlaneProblem(config)) return config;
  return { ...config, format: 2, orientifolds: [...(config.orientifolds ?? []), defaultPlane(config)] };
}

/** Removes a plane (the `orientifolds` field goes when it empties). */
export function removePlane(config: Configuration, id: string): Configuration {
  const rest = (config.orientifolds ?? []).filter((plane) => plane.id !== id);
  const { orientifolds: _dropped, ...withoutPlanes } = config;
  return rest.length > 0 ? { ...config, orientifolds: rest } : withoutPlanes;
}

function editPlane(config: Configuration, id: string, change: (plane: OrientifoldPlane) => OrientifoldPlane): Configuration {
  return { ...config, orientifolds: (config.orientifolds ?? []).map((plane) => (plane.id === id ? change(plane) : plane)) };
}

/** Sets O- or O+. */
export function setPlaneType(config: Configuration, id: string, type: OrientifoldType): Configuration {
  return editPlane(config, id, (plane) => ({ ...plane, type }));
}

/** Flips one axis between Neumann (along the plane) and Dirichlet (at position 0). */
export function togglePlaneAxis(config: Configuration, id: string, axis: number): Configuration {
  return editPlane(config, id, (plane) => {
    const key = String(axis);
    if (plane.worldvolume.includes(axis)) return { ...plane, worldvolume: plane.worldvolume.filter((a) => a !== axis) };
    const { [key]: _removed, ...position } = plane.position;
    return { ...plane, worldvolume: [...plane.worldvolume, axis].sort((x, y) => x - y), position };
  });
}

/** Sets the position on a Dirichlet axis (0 is left out, as for stacks). */
export function setPlanePosition(config: Configuration, id: string, axis: number, value: number): Configuration {
  if (!Number.isFinite(value)) return config;
  return editPlane(config, id, (plane) => {
    const key = String(axis);
    const { [key]: _old, ...rest } = plane.position;
    return { ...plane, position: value === 0 ? rest : { ...rest, [key]: value } };
  });
}
