import { z } from "zod";
import { listAuditLog } from "@/db/queries/audit-log";
import { route } from "@/lib/server/route";

const auditQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(100),
  before: z.iso.datetime({ offset: true }).transform((value) => new Date(value)).optional(),
});

/** GET /api/groups/[groupId]/audit?limit=&before=: the group's audit log, newest first (owners only). */
export const GET = route({ params: ["groupId"], query: auditQuerySchema }, async ({ actor, params, query }) =>
  Response.json(await listAuditLog(actor, params.groupId, query)),
);
