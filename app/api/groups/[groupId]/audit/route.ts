import { z } from "zod";
import { listAuditLog } from "@/db/queries/audit-log";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface AuditRouteContext {
  params: Promise<{ groupId: string }>;
}

const auditQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(100),
  before: z.iso.datetime({ offset: true }).transform((value) => new Date(value)).optional(),
});

/** GET /api/groups/[groupId]/audit?limit=&before=: the group's audit log, newest first (owners only). */
export async function GET(request: Request, context: AuditRouteContext): Promise<Response> {
  try {
    const { groupId } = await context.params;
    const query = auditQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
    return Response.json(await listAuditLog(await getCurrentUser(), groupId, query));
  } catch (error) {
    return toErrorResponse(error);
  }
}
