import { listAuditLog } from "@/db/queries/audit-log";
import { route } from "@/lib/server/route";
import { auditQuerySchema } from "@/lib/validations/group";

/** GET /api/groups/[groupId]/audit?limit=&before=: the group's audit log, newest first (owners only). */
export const GET = route({ params: ["groupId"], query: auditQuerySchema }, async ({ actor, params, query }) =>
  Response.json(await listAuditLog(actor, params.groupId, query)),
);
