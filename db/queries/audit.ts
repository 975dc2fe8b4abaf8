import "server-only";
import type { Executor } from "../index";
import { auditLog } from "../schema";

/** One audit entry; `action` is a dotted verb such as "configuration.update". */
export interface AuditEntry {
  actorId: string | null;
  groupId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  details?: Record<string, unknown>;
}

/** Records a write in the audit log. Call it inside the write's transaction so both land or neither. */
export async function recordAudit(executor: Executor, entry: AuditEntry): Promise<void> {
  await executor.insert(auditLog).values({ ...entry, details: entry.details ?? {} });
}
