import type { OrientifoldSummary } from "@/lib/boundary/types";
import { Badge } from "@/components/ui/badge";

export interface OrientifoldPanelProps {
  summary: OrientifoldSummary;
}

/**
 * The orientifold part of a result: each plane with its RR charge, the image of every stack, and the
 * tadpole balance per p with a warning and what would cancel it (charges in units of one Dp brane
 * with its image; alpha' = 1).
 */
export function OrientifoldPanel({ summary }: OrientifoldPanelProps) {
  return (
    <div className="grid gap-3" data-testid="orientifold-panel">
      <ul className="flex flex-wrap gap-2 text-sm">
        {summary.planes.map((plane) => (
          <li key={plane.id} className="rounded-md border border-border bg-surface px-3 py-1.5">
            <span className="font-mono">{plane.id}</span>: {plane.type.replace("O", `O${plane.p}`)} plane, RR charge {plane.charge}
            <span className="text-muted-foreground"> (Op&minus; carries &minus;2^(p&minus;5), Op+ +2^(p&minus;5))</span>
          </li>
        ))}
      </ul>
      <div className="overflow-x-auto rounded-md border border-border bg-surface">
        <table className="w-full border-collapse text-sm" aria-label="Tadpole balance" data-testid="tadpole-table">
          <thead className="bg-surface-muted/70 text-xs text-muted-foreground">
            <tr>
              <th scope="col" className="px-3 py-1.5 text-left font-semibold">p</th>
              <th scope="col" className="px-3 py-1.5 text-right font-semibold">Stacks</th>
              <th scope="col" className="px-3 py-1.5 text-right font-semibold">Planes</th>
              <th scope="col" className="px-3 py-1.5 text-right font-semibold">Net</th>
              <th scope="col" className="px-3 py-1.5 text-left font-semibold">Balance</th>
            </tr>
          </thead>
          <tbody>
            {summary.tadpoles.length === 0 ? (
              <tr>
                <td colSpan={5} className="px-3 py-2 text-muted-foreground">
                  No RR charges to balance (the bosonic string has none).
                </td>
              </tr>
            ) : null}
            {summary.tadpoles.map((entry) => (
              <tr key={entry.p} className="border-t border-border align-top">
                <td className="px-3 py-1.5 font-mono">D{entry.p}</td>
                <td className="px-3 py-1.5 text-right font-mono">{entry.stacks}</td>
                <td className="px-3 py-1.5 text-right font-mono">{entry.planes}</td>
                <td className="px-3 py-1.5 text-right font-mono">{entry.net}</td>
                <td className="px-3 py-1.5">
                  <Badge variant={entry.status === "cancelled" ? "success" : entry.status === "projected out" ? "outline" : "warning"}>{entry.status}</Badge>{" "}
                  {entry.message}
                  {entry.toCancel ? <span className="block text-warning-soft-foreground">To cancel: {entry.toCancel}</span> : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="overflow-x-auto rounded-md border border-border bg-surface">
        <table className="w-full border-collapse text-sm" aria-label="Image stacks" data-testid="image-table">
          <thead className="bg-surface-muted/70 text-xs text-muted-foreground">
            <tr>
              <th scope="col" className="px-3 py-1.5 text-left font-semibold">Image</th>
              <th scope="col" className="px-3 py-1.5 text-left font-semibold">Of stack</th>
              <th scope="col" className="px-3 py-1.5 text-left font-semibold">Position</th>
              <th scope="col" className="px-3 py-1.5 text-left font-semibold">Orientation</th>
            </tr>
          </thead>
          <tbody>
            {summary.images.map((image) => (
              <tr key={image.id} className="border-t border-border">
                <td className="px-3 py-1.5 font-mono">{image.id}</td>
                <td className="px-3 py-1.5 font-mono">{image.of}</td>
                <td className="px-3 py-1.5 font-mono">
                  {image.onPlane
                    ? "on the plane (its own image)"
                    : Object.entries(image.position)
                        .map(([axis, value]) => `x${axis} = ${value}`)
                        .join(", ") || "origin"}
                </td>
                <td className="px-3 py-1.5">{image.anti ? "antibrane" : "brane"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <ul className="list-disc pl-5 text-xs text-muted-foreground">
        {summary.notes.map((note) => (
          <li key={note}>{note}</li>
        ))}
      </ul>
    </div>
  );
}
