import { pingDatabase } from "@/db/queries/health";

/**
 * GET /api/health: 200 `{ ok: true, database: { ok: true, latencyMs } }` when the app and its
 * database answer, 503 `{ ok: false, database: { ok: false, error } }` when PostgreSQL does not.
 * Never cached (`private, no-store`, like every API answer a signed-in browser may get); used by
 * load balancers and as the yardstick of `npm run bench:api`.
 */
export async function GET(): Promise<Response> {
  const headers = { "cache-control": "private, no-store" };
  try {
    const { latencyMs } = await pingDatabase();
    return Response.json({ ok: true, database: { ok: true, latencyMs } }, { headers });
  } catch (error) {
    console.error("GET /api/health: database ping failed", error);
    return Response.json(
      { ok: false, database: { ok: false, error: "The database is not reachable." } },
      { status: 503, headers },
    );
  }
}
