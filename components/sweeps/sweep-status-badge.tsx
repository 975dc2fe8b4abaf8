import { Badge, type BadgeVariant } from "@/components/ui/badge";
import type { SweepStatus } from "@/db/schema";

const variants: Record<SweepStatus, BadgeVariant> = { running: "accent", completed: "success", cancelled: "neutral", failed: "danger" };

/** A sweep's status as a badge. */
export function SweepStatusBadge({ status }: { status: SweepStatus }) {
  return <Badge variant={variants[status]}>{status}</Badge>;
}
