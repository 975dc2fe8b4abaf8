import { InlineCode } from "@/components/docs/inline-code";

/** The part of a JSON Schema (OpenAPI 3.1 dialect) the reference shows. */
export interface JsonSchema {
  $ref?: string;
  type?: string | string[];
  description?: string;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  prefixItems?: JsonSchema[];
  additionalProperties?: JsonSchema | boolean;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
  enum?: unknown[];
  const?: unknown;
  format?: string;
  pattern?: string;
  minimum?: number;
  maximum?: number;
  minLength?: number;
  maxLength?: number;
  default?: unknown;
}

export interface SchemaViewProps {
  schema: JsonSchema;
}

/** The name of a component schema from its reference, e.g. "#/components/schemas/Error" -> "Error". */
export function refName(ref: string): string {
  return ref.slice(ref.lastIndexOf("/") + 1);
}

/** The anchor of a component schema's section on the page. */
export function schemaAnchor(name: string): string {
  return `schema-${name}`;
}

/** A schema as a readable list of fields: name, type, whether required, limits and description. */
export function SchemaView({ schema }: SchemaViewProps) {
  if (schema.properties) return <FieldList schema={schema} />;
  if (schema.items?.properties) {
    return (
      <div className="grid gap-1.5">
        <p className="text-xs text-muted-foreground">A list of:</p>
        <FieldList schema={schema.items} />
      </div>
    );
  }
  return (
    <p className="text-sm">
      <TypeText schema={schema} />
      {schema.description ? <span className="text-muted-foreground"> · {schema.description}</span> : null}
    </p>
  );
}

function FieldList({ schema }: { schema: JsonSchema }) {
  const required = new Set(schema.required ?? []);
  return (
    <ul className="divide-y divide-border rounded-md border border-border bg-surface text-sm">
      {Object.entries(schema.properties ?? {}).map(([name, property]) => (
        <li key={name} className="grid gap-1 px-3 py-2">
          <div className="flex flex-wrap items-baseline gap-x-2 gap-y-1">
            <code className="font-mono text-[13px] font-semibold">{name}</code>
            <span className="font-mono text-xs text-muted-foreground">
              <TypeText schema={property} />
            </span>
            {required.has(name) ? <span className="text-xs font-medium text-warning-soft-foreground">required</span> : null}
            <Limits schema={property} />
          </div>
          {property.description ? (
            <p className="text-xs text-muted-foreground">
              <InlineCode text={property.description} />
            </p>
          ) : null}
          {nestedObject(property) ? (
            <div className="pl-3">
              <FieldList schema={nestedObject(property) ?? {}} />
            </div>
          ) : null}
        </li>
      ))}
    </ul>
  );
}

/** A nested object worth listing field by field (not a reference, which links to its own section). */
function nestedObject(schema: JsonSchema): JsonSchema | null {
  if (schema.properties) return schema;
  if (schema.items?.properties) return schema.items;
  return null;
}

/** The type of a schema in a short notation: `string`, `integer | null`, `Error`, `list of Stack`. */
function TypeText({ schema }: { schema: JsonSchema }) {
  if (schema.$ref) {
    const name = refName(schema.$ref);
    return (
      <a href={`#${schemaAnchor(name)}`} className="text-accent underline-offset-2 hover:underline">
        {name}
      </a>
    );
  }
  const variants = schema.anyOf ?? schema.oneOf;
  if (variants) {
    return (
      <>
        {variants.map((variant, index) => (
          <span key={index}>
            {index > 0 ? " | " : null}
            <TypeText schema={variant} />
          </span>
        ))}
      </>
    );
  }
  if (schema.enum) return <>{schema.enum.map((value) => JSON.stringify(value)).join(" | ")}</>;
  if (schema.const !== undefined) return <>{JSON.stringify(schema.const)}</>;
  const types = Array.isArray(schema.type) ? schema.type : schema.type ? [schema.type] : [];
  if (types.includes("array")) {
    const item = schema.items ?? schema.prefixItems?.[0];
    return (
      <>
        {schema.prefixItems ? `pair of ` : "list of "}
        {item ? <TypeText schema={item} /> : "values"}
        {types.includes("null") ? " | null" : null}
      </>
    );
  }
  if (types.includes("object") && !schema.properties && typeof schema.additionalProperties === "object") {
    return (
      <>
        map of <TypeText schema={schema.additionalProperties} />
      </>
    );
  }
  return <>{[...types.map((type) => (type === "string" && schema.format ? `${type} (${schema.format})` : type))].join(" | ") || "any"}</>;
}

function Limits({ schema }: { schema: JsonSchema }) {
  const parts: string[] = [];
  if (schema.minimum !== undefined) parts.push(`≥ ${schema.minimum}`);
  if (schema.maximum !== undefined) parts.push(`≤ ${schema.maximum}`);
  if (schema.minLength !== undefined) parts.push(`at least ${schema.minLength} characters`);
  if (schema.maxLength !== undefined) parts.push(`at most ${schema.maxLength} characters`);
  if (schema.pattern) parts.push(`matches ${schema.pattern}`);
  if (schema.default !== undefined) parts.push(`default ${JSON.stringify(schema.default)}`);
  if (parts.length === 0) return null;
  return <span className="text-xs text-muted-foreground">{parts.join(" · ")}</span>;
}
