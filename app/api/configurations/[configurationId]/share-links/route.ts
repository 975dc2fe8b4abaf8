import { createShareLink, listShareLinks } from "@/db/queries/share-links";
import { toErrorResponse } from "@/lib/errors";
import { absoluteUrl } from "@/lib/server/mail";
import { getCurrentUser } from "@/lib/server/session";

interface ShareLinksRouteContext {
  params: Promise<{ configurationId: string }>;
}

/** GET /api/configurations/[configurationId]/share-links: links with their state, no tokens (editors and owners). */
export async function GET(_request: Request, context: ShareLinksRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    return Response.json(await listShareLinks(await getCurrentUser(), configurationId));
  } catch (error) {
    return toErrorResponse(error);
  }
}

/**
 * POST /api/configurations/[configurationId]/share-links: a new read-only link (editors and owners).
 * 201 `{ link, url }`; the URL is shown only now, since only a digest of its token is stored.
 */
export async function POST(_request: Request, context: ShareLinksRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const { link, token } = await createShareLink(await getCurrentUser(), configurationId);
    return Response.json({ link, url: absoluteUrl(`/share/${token}`) }, { status: 201 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
