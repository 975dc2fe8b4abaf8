"use client";

import type { OrientifoldType } from "@/lib/boundary/types";
import { planeCharge } from "@/lib/boundary/tadpole";
import { formatRational } from "@/lib/boundary/rational";
import { spatialAxes } from "@/lib/designer/document";
import { addPlaneProblem } from "@/lib/designer/orientifold-document";
import { selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { Button } from "@/components/ui/button";
import { BoundaryAxisCell } from "./boundary-axis-cell";

export interface OrientifoldGridProps {
  readOnly?: boolean;
}

/**
 * The orientifold plane in the boundary grid: type O- or O+, N or D per axis with the position in D
 * cells, its RR charge, and add and remove. Keyboard-only like the stack rows; every stack off the
 * plane gets an image, drawn faintly on the canvas.
 */
export function OrientifoldGrid({ readOnly = false }: OrientifoldGridProps) {
  const document = useDesignerStore(selectDocument);
  const { addPlane, removePlane, setPlaneType, togglePlaneAxis, setPlanePosition } = useDesignerStore.getState();
  const planes = document.orientifolds ?? [];
  const axes = spatialAxes(document);
  const problem = addPlaneProblem(document);
  return (
    <section aria-labelledby="orientifold-grid-title" className="grid gap-2" data-testid="orientifold-grid">
      <div className="flex items-center justify-between gap-2">
        <h3 id="orientifold-grid-title" className="text-sm font-semibold">
          Orientifold plane
          <span className="ml-2 font-normal text-muted-foreground">reflects its D axes; each stack off it gets an image</span>
        </h3>
        {!readOnly && !problem ? (
          <Button size="sm" variant="secondary" onClick={() => addPlane()}>
            Add orientifold plane
          </Button>
        ) : null}
      </div>
      {planes.length === 0 ? (
        <p className="text-xs text-muted-foreground">No orientifold plane: strings are oriented and groups unitary.</p>
      ) : (
        <div className="relative overflow-x-auto rounded-lg border border-border bg-surface">
          <table className="w-full border-collapse text-xs" aria-label="Orientifold planes">
            <thead className="bg-surface-muted/70 text-muted-foreground">
              <tr>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Id</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Type</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">RR charge</th>
                {axes.map((axis) => (
                  <th key={axis} scope="col" className="px-1 py-1.5 text-center font-mono font-semibold">
                    x{axis}
                  </th>
                ))}
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {planes.map((plane) => (
                <tr key={plane.id} className="border-t border-border">
                  <td className="px-2 py-1 font-mono">{plane.id}</td>
                  <td className="px-2 py-1">
                    <select
                      value={plane.type}
                      disabled={readOnly}
                      onChange={(event) => setPlaneType(plane.id, event.target.value as OrientifoldType)}
                      aria-label={`Type of plane ${plane.id}`}
                      className="h-7 rounded border border-border-strong bg-surface px-1"
                    >
                      <option value="O-">O{plane.worldvolume.length}&minus; (SO on it)</option>
                      <option value="O+">O{plane.worldvolume.length}+ (USp on it)</option>
                    </select>
                  </td>
                  <td className="px-2 py-1 font-mono" title="In units of one brane of the same p with its image">
                    {formatRational(planeCharge(plane))}
                  </td>
                  {axes.map((axis) => {
                    const neumann = plane.worldvolume.includes(axis);
                    return (
                      <BoundaryAxisCell
                        key={axis}
                        axis={axis}
                        neumann={neumann}
                        position={plane.position[String(axis)] ?? 0}
                        readOnly={readOnly}
                        toggleLabel={`Plane ${plane.id}, axis x${axis}: ${neumann ? "Neumann" : "Dirichlet"}`}
                        positionLabel={`Position of plane ${plane.id} on x${axis}`}
                        onToggle={() => togglePlaneAxis(plane.id, axis)}
                        onCommit={(value) => setPlanePosition(plane.id, axis, value)}
                      />
                    );
                  })}
                  <td className="px-2 py-1">
                    {!readOnly ? (
                      <Button size="sm" variant="secondary" onClick={() => removePlane(plane.id)} aria-label={`Remove plane ${plane.id}`}>
                        Remove
                      </Button>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
