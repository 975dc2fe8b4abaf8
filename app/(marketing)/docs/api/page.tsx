import type { Metadata } from "next";
import Link from "next/link";
import { ApiReference, type ApiDocument } from "@/components/docs/api-reference";
import { PageContainer } from "@/components/layout/page-container";
import { PageHeader } from "@/components/ui/page-header";
import { getOpenApiDocument } from "@/lib/openapi/document";

export const metadata: Metadata = { title: "API reference" };

export default function ApiReferencePage() {
  const document = getOpenApiDocument() as unknown as ApiDocument;
  return (
    <PageContainer className="grid gap-8">
      <PageHeader
        title="API reference"
        description={`${document.info.title} ${document.info.version}: every route, who may call it, what it takes and what it answers.`}
      />
      <div className="grid max-w-3xl gap-2 text-sm text-muted-foreground">
        <p>{document.info.description}</p>
        <p>
          Scripts authenticate with a personal API token from your{" "}
          <Link href="/account" className="text-accent underline-offset-2 hover:underline">
            account page
          </Link>
          , sent as <code className="font-mono">Authorization: Bearer &lt;token&gt;</code>. The machine-readable document is at{" "}
          <a href="/api/openapi.json" className="font-mono text-accent underline-offset-2 hover:underline">
            /api/openapi.json
          </a>{" "}
          (OpenAPI 3.1); the README has curl and Python examples.
        </p>
      </div>
      <ApiReference document={document} />
    </PageContainer>
  );
}
