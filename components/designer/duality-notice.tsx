"use client";

import { formatNumber } from "@/lib/spectrum";
import { useDesignerStore } from "@/lib/client/designer-store";
import { Alert } from "@/components/ui/alert";

export interface DualityNoticeProps {
  /** Opens the fork dialog for the draft; absent when the user may write to no space. */
  onFork?: () => void;
}

/**
 * What the last T-duality did, while it is the latest edit, with the ways on from there: undo,
 * save, or fork the dual configuration as a new one.
 */
export function DualityNotice({ onFork }: DualityNoticeProps) {
  const duality = useDesignerStore((s) => s.lastDuality);
  const { undo } = useDesignerStore.getState();
  if (duality === null) return null;
  const theory = duality.theoryBefore === duality.theoryAfter ? "" : `, ${duality.theoryBefore} \u2192 ${duality.theoryAfter}`;
  return (
    <Alert variant="info" title={`T-dualised along x${duality.axis}`}>
      <span data-testid="duality-notice">
        R = {formatNumber(duality.radiusBefore)} &rarr; {formatNumber(duality.radiusAfter)}
        {theory}; N and D swapped on x{duality.axis} for every stack, Wilson lines and positions exchanged. The spectrum is
        the same state by state, with momentum and winding on x{duality.axis} exchanged.
      </span>{" "}
      <button type="button" onClick={undo} className="font-medium underline">
        Undo
      </button>
      {onFork ? (
        <>
          {" "}
          &middot;{" "}
          <button type="button" onClick={onFork} className="font-medium underline">
            Fork the dual configuration
          </button>
        </>
      ) : null}
    </Alert>
  );
}
