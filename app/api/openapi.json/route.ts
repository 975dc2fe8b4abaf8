import { getOpenApiDocument } from "@/lib/openapi/document";

/**
 * GET /api/openapi.json: the OpenAPI 3.1 document of the API (lib/openapi/document.ts), public
 * and the same for every caller. Like the health check it reads no caller at all, so it does not
 * go through `route()`: a script that sends its token everywhere still gets the document.
 */
export function GET(): Response {
  return Response.json(getOpenApiDocument(), { headers: { "cache-control": "public, max-age=300" } });
}
