import { createShareLink, listShareLinks } from "@/db/queries/share-links";
import { absoluteUrl } from "@/lib/server/mail";
import { route } from "@/lib/server/route";

/** GET /api/configurations/[configurationId]/share-links: links with their state, no tokens (editors and owners). */
export const GET = route({ params: ["configurationId"] }, async ({ actor, params }) =>
  Response.json(await listShareLinks(actor, params.configurationId)),
);

/**
 * POST /api/configurations/[configurationId]/share-links: a new read-only link (editors and owners).
 * 201 `{ link, url }`; the URL is shown only now, since only a digest of its token is stored.
 */
export const POST = route({ params: ["configurationId"] }, async ({ actor, params }) => {
  const { link, token } = await createShareLink(actor, params.configurationId);
  return Response.json({ link, url: absoluteUrl(`/share/${token}`) }, { status: 201 });
});
