import { revokeShareLink } from "@/db/queries/share-links";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface ShareLinkRouteContext {
  params: Promise<{ shareLinkId: string }>;
}

/** DELETE /api/share-links/[shareLinkId]: revokes the link (editors and owners); its page then answers 404. */
export async function DELETE(_request: Request, context: ShareLinkRouteContext): Promise<Response> {
  try {
    const { shareLinkId } = await context.params;
    return Response.json(await revokeShareLink(await getCurrentUser(), shareLinkId));
  } catch (error) {
    return toErrorResponse(error);
  }
}
