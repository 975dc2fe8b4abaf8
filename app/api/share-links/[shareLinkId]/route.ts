import { revokeShareLink } from "@/db/queries/share-links";
import { route } from "@/lib/server/route";

/** DELETE /api/share-links/[shareLinkId]: revokes the link (editors and owners); its page then answers 404. */
export const DELETE = route({ params: ["shareLinkId"] }, async ({ actor, params }) =>
  Response.json(await revokeShareLink(actor, params.shareLinkId)),
);
