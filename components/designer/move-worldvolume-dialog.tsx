"use client";

import { useState } from "react";
import type { Configuration } from "@/lib/boundary/types";
import { spatialAxes } from "@/lib/designer/document";
import { stackKind } from "@/lib/designer/stack-kind";
import { selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Select } from "@/components/ui/select";

export interface MoveWorldvolumeDialogProps {
  /** The stack whose worldvolume moves; the dialog is closed while null. */
  stackId: string | null;
  onClose: () => void;
}

/**
 * A paired N<->D flip: "move the worldvolume of the probe from x4 to x6". One Neumann axis becomes
 * Dirichlet and one Dirichlet axis Neumann in one step, so p keeps its IIA/IIB parity, where two
 * single flips in the grid would pass through a configuration the engine refuses.
 */
export function MoveWorldvolumeDialog({ stackId, onClose }: MoveWorldvolumeDialogProps) {
  const document = useDesignerStore(selectDocument);
  const stack = document.stacks.find((s) => s.id === stackId) ?? null;
  return (
    <Dialog
      open={stack !== null}
      onOpenChange={(open) => {
        if (!open) onClose();
      }}
      title={stack ? `Move the worldvolume of ${stack.label || stack.id}` : "Move the worldvolume"}
      description="One direction along the brane moves to another axis: that axis becomes Neumann and the old one Dirichlet, so the brane keeps its dimension."
    >
      {stack ? <MoveForm key={stack.id} document={document} stackId={stack.id} onDone={onClose} /> : null}
    </Dialog>
  );
}

function MoveForm({ document, stackId, onDone }: { document: Configuration; stackId: string; onDone: () => void }) {
  const stack = document.stacks.find((s) => s.id === stackId);
  const neumann = stack?.worldvolume ?? [];
  const dirichlet = spatialAxes(document).filter((axis) => !neumann.includes(axis));
  const [from, setFrom] = useState(neumann.at(-1) ?? 0);
  const [to, setTo] = useState(dirichlet.find((axis) => axis > from) ?? dirichlet[0] ?? 0);
  if (!stack) return null;
  if (neumann.length === 0 || dirichlet.length === 0) {
    return (
      <p className="text-sm text-muted-foreground">
        {neumann.length === 0
          ? `${stack.label || stack.id} is a D0: it has no direction along the brane to move. Flip single axes in the grid instead.`
          : `${stack.label || stack.id} fills every spatial axis: there is no Dirichlet axis to move to.`}
      </p>
    );
  }
  const kind = stackKind(stack, document.theory);
  const position = stack.position[String(to)] ?? 0;
  return (
    <form
      className="grid gap-3 text-sm"
      onSubmit={(event) => {
        event.preventDefault();
        useDesignerStore.getState().moveWorldvolume(stack.id, from, to);
        onDone();
      }}
    >
      <div className="flex flex-wrap items-center gap-2">
        <span>Move the worldvolume from</span>
        <Select aria-label="From axis (Neumann now)" value={from} onChange={(event) => setFrom(Number(event.target.value))} className="w-24 font-mono">
          {neumann.map((axis) => (
            <option key={axis} value={axis}>
              x{axis}
            </option>
          ))}
        </Select>
        <span>to</span>
        <Select aria-label="To axis (Dirichlet now)" value={to} onChange={(event) => setTo(Number(event.target.value))} className="w-24 font-mono">
          {dirichlet.map((axis) => (
            <option key={axis} value={axis}>
              x{axis}
            </option>
          ))}
        </Select>
      </div>
      <p className="text-muted-foreground" role="status">
        The {kind} stays a {kind}: x{from} becomes Dirichlet at {position} (its position on x{to} until now) and x{to} becomes Neumann.
      </p>
      <div className="flex justify-end gap-2">
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit">
          Move x{from} to x{to}
        </Button>
      </div>
    </form>
  );
}
