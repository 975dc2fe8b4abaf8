import { InlineCode } from "@/components/docs/inline-code";
import { SchemaView, refName, schemaAnchor, type JsonSchema } from "@/components/docs/schema-view";
import { Badge, type BadgeVariant } from "@/components/ui/badge";

/** The part of an OpenAPI 3.1 document the reference shows. */
export interface ApiDocument {
  info: { title: string; version: string; description?: string };
  tags?: { name: string; description?: string }[];
  paths: Record<string, Record<string, ApiOperation>>;
  components?: { schemas?: Record<string, JsonSchema>; securitySchemes?: Record<string, { description?: string }> };
}

interface ApiOperation {
  tags?: string[];
  summary?: string;
  description?: string;
  security?: Record<string, string[]>[];
  "x-token-scope"?: "read" | "write";
  parameters?: { name: string; in: string; required?: boolean; description?: string; schema?: JsonSchema }[];
  requestBody?: { content: Record<string, { schema?: JsonSchema; example?: unknown }> };
  responses: Record<string, { description: string; content?: Record<string, { schema?: JsonSchema }> }>;
}

export interface ApiReferenceProps {
  document: ApiDocument;
}

const methodVariant: Record<string, BadgeVariant> = { get: "accent", post: "success", put: "warning", patch: "warning", delete: "danger" };

/**
 * The API reference, rendered on the server from the OpenAPI document itself (nothing loaded from
 * elsewhere): operations by tag with who may call them, parameters, bodies with examples and
 * answers, then every named schema.
 */
export function ApiReference({ document }: ApiReferenceProps) {
  const operations = Object.entries(document.paths).flatMap(([path, item]) =>
    Object.entries(item).map(([method, operation]) => ({ path, method, operation, id: operationAnchor(method, path) })),
  );
  const tags = (document.tags ?? []).map((tag) => ({ ...tag, operations: operations.filter((entry) => entry.operation.tags?.includes(tag.name)) }));
  const schemas = Object.entries(document.components?.schemas ?? {}).sort(([a], [b]) => a.localeCompare(b));

  return (
    <div className="grid gap-8 lg:grid-cols-[15rem_1fr]">
      <nav aria-label="API sections" className="lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
        <ul className="grid gap-4 text-sm">
          {tags.map((tag) => (
            <li key={tag.name}>
              <a href={`#tag-${tag.name}`} className="font-semibold hover:underline">
                {tag.name}
              </a>
              <ul className="mt-1 grid gap-0.5">
                {tag.operations.map((entry) => (
                  <li key={entry.id}>
                    <a href={`#${entry.id}`} className="text-muted-foreground hover:text-foreground hover:underline">
                      {entry.operation.summary ?? `${entry.method.toUpperCase()} ${entry.path}`}
                    </a>
                  </li>
                ))}
              </ul>
            </li>
          ))}
          <li>
            <a href="#schemas" className="font-semibold hover:underline">
              Schemas
            </a>
          </li>
        </ul>
      </nav>
      <div className="grid min-w-0 gap-10">
        {tags.map((tag) => (
          <section key={tag.name} aria-labelledby={`tag-${tag.name}`} className="grid gap-6">
            <div className="border-b border-border pb-2">
              <h2 id={`tag-${tag.name}`} className="text-xl font-semibold tracking-tight">
                {tag.name}
              </h2>
              {tag.description ? <p className="text-sm text-muted-foreground">{tag.description}</p> : null}
            </div>
            {tag.operations.map((entry) => (
              <OperationView key={entry.id} {...entry} />
            ))}
          </section>
        ))}
        <section aria-labelledby="schemas" className="grid gap-6">
          <h2 id="schemas" className="border-b border-border pb-2 text-xl font-semibold tracking-tight">
            Schemas
          </h2>
          {schemas.map(([name, schema]) => (
            <div key={name} className="grid gap-2">
              <h3 id={schemaAnchor(name)} className="font-mono text-base font-semibold">
                {name}
              </h3>
              {schema.description ? (
                <p className="text-sm text-muted-foreground">
                  <InlineCode text={schema.description} />
                </p>
              ) : null}
              <SchemaView schema={schema} />
            </div>
          ))}
        </section>
      </div>
    </div>
  );
}

function OperationView({ path, method, operation, id }: { path: string; method: string; operation: ApiOperation; id: string }) {
  const body = Object.entries(operation.requestBody?.content ?? {})[0];
  return (
    <article aria-labelledby={id} className="grid gap-4 rounded-lg border border-border bg-surface-raised p-4">
      <header className="grid gap-1.5">
        <h3 id={id} className="flex flex-wrap items-center gap-2 text-base font-semibold">
          <Badge variant={methodVariant[method] ?? "neutral"} className="font-mono">
            {method.toUpperCase()}
          </Badge>
          <code className="font-mono text-sm break-all">{path}</code>
        </h3>
        <p className="font-medium">{operation.summary}</p>
        {operation.description
          ? operation.description.split("\n\n").map((paragraph, index) => (
              <p key={index} className="text-sm text-muted-foreground">
                <InlineCode text={paragraph} />
              </p>
            ))
          : null}
        <p className="text-xs text-muted-foreground">
          <span className="font-medium text-foreground">Who may call it: </span>
          {accessText(operation)}
        </p>
      </header>
      {operation.parameters && operation.parameters.length > 0 ? (
        <div className="grid gap-1.5">
          <h4 className="text-sm font-semibold">Parameters</h4>
          <SchemaView
            schema={{
              type: "object",
              required: operation.parameters.filter((parameter) => parameter.required).map((parameter) => parameter.name),
              properties: Object.fromEntries(
                operation.parameters.map((parameter) => [
                  parameter.name,
                  { ...parameter.schema, description: [`in ${parameter.in}`, parameter.description ?? parameter.schema?.description].filter(Boolean).join(" · ") },
                ]),
              ),
            }}
          />
        </div>
      ) : null}
      {body ? (
        <div className="grid gap-1.5">
          <h4 className="text-sm font-semibold">
            Request body <span className="font-mono text-xs font-normal text-muted-foreground">{body[0]}</span>
          </h4>
          {body[1].schema ? <SchemaView schema={body[1].schema} /> : null}
          {body[1].example !== undefined ? (
            <details className="rounded-md border border-border">
              <summary className="cursor-pointer px-3 py-1.5 text-sm">Example</summary>
              <pre className="overflow-x-auto border-t border-border bg-surface-muted/50 p-3 font-mono text-xs">{JSON.stringify(body[1].example, null, 2)}</pre>
            </details>
          ) : null}
        </div>
      ) : null}
      <div className="grid gap-1.5">
        <h4 className="text-sm font-semibold">Answers</h4>
        <ul className="grid gap-1 text-sm">
          {Object.entries(operation.responses).map(([status, response]) => {
            const schema = Object.values(response.content ?? {})[0]?.schema;
            return (
              <li key={status} className="grid grid-cols-[3rem_1fr] gap-2">
                <span className={`font-mono font-semibold ${status.startsWith("2") ? "text-success-soft-foreground" : "text-muted-foreground"}`}>{status}</span>
                <span>
                  <InlineCode text={response.description} />
                  {schema?.$ref ? (
                    <>
                      {" "}
                      <a href={`#${schemaAnchor(refName(schema.$ref))}`} className="font-mono text-xs text-accent underline-offset-2 hover:underline">
                        {refName(schema.$ref)}
                      </a>
                    </>
                  ) : null}
                </span>
              </li>
            );
          })}
        </ul>
      </div>
    </article>
  );
}

function accessText(operation: ApiOperation): string {
  const schemes = new Set((operation.security ?? []).flatMap((requirement) => Object.keys(requirement)));
  const anonymous = (operation.security ?? []).some((requirement) => Object.keys(requirement).length === 0);
  if (schemes.size === 0) return "anyone; no sign-in is read.";
  const ways = [schemes.has("sessionCookie") ? "a signed-in session" : null, schemes.has("apiToken") ? apiTokenText(operation["x-token-scope"]) : null].filter(Boolean);
  return `${anonymous ? "anyone, or " : ""}${ways.join(" or ")}.`;
}

function apiTokenText(scope: "read" | "write" | undefined): string {
  return scope === "write" ? "an API token with read and write access" : "an API token (read only or read and write)";
}

function operationAnchor(method: string, path: string): string {
  return `${method}-${path.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "")}`;
}
