// A JSON Schema (as found in the OpenAPI document) as a nested list of fields:
// name, type, whether required, limits and description. Our own plain rendering.
type Schema = {
  type?: string;
  format?: string;
  enum?: unknown[];
  properties?: Record<string, Schema>;
  required?: string[];
  items?: Schema;
  anyOf?: Schema[];
  oneOf?: Schema[];
  additionalProperties?: Schema | boolean;
  description?: string;
  minimum?: number;
  maximum?: number;
  minLength?: number;
  maxLength?: number;
  maxItems?: number;
  nullable?: boolean;
  $ref?: string;
};

export function describeType(s: Schema): string {
  if (s.$ref) return s.$ref.split("/").pop() ?? "object";
  if (s.enum) return s.enum.map((e) => JSON.stringify(e)).join(" | ");
  if (s.anyOf || s.oneOf) return (s.anyOf ?? s.oneOf ?? []).map(describeType).join(" or ");
  if (s.type === "array") return `array of ${s.items ? describeType(s.items) : "any"}`;
  const base = s.format ? `${s.type} (${s.format})` : (s.type ?? "any");
  return s.nullable ? `${base} or null` : base;
}

function describeLimits(s: Schema): string {
  const out: string[] = [];
  if (s.minimum !== undefined) out.push(`≥ ${s.minimum}`);
  if (s.maximum !== undefined && s.maximum < 1e15) out.push(`≤ ${s.maximum}`);
  if (s.minLength !== undefined && s.minLength > 0) out.push(`at least ${s.minLength} characters`);
  if (s.maxLength !== undefined) out.push(`at most ${s.maxLength} characters`);
  if (s.maxItems !== undefined) out.push(`at most ${s.maxItems} items`);
  return out.join(", ");
}

export function SchemaView({ schema, depth = 0 }: { schema: Schema; depth?: number }) {
  const target = schema.type === "array" && schema.items ? schema.items : schema;
  const props = target.properties;
  const nested = target.additionalProperties && typeof target.additionalProperties === "object" ? target.additionalProperties : null;
  if (!props) {
    return (
      <p className="text-sm">
        <code>{describeType(schema)}</code>
        {nested && <span className="text-ink-soft"> (map of {describeType(nested)})</span>}
        {schema.description && <span className="text-ink-soft"> — {schema.description}</span>}
      </p>
    );
  }
  return (
    <ul className={depth > 0 ? "ml-4 border-l border-line pl-3" : ""}>
      {schema.type === "array" && <li className="text-xs text-ink-soft">array of:</li>}
      {Object.entries(props).map(([name, p]) => (
        <li key={name} className="py-0.5 text-sm">
          <code className="font-medium">{name}</code>{" "}
          <span className="text-ink-soft">{describeType(p)}</span>
          {target.required?.includes(name) ? <span className="ml-1 text-xs text-copper-dark">required</span> : null}
          {describeLimits(p) && <span className="ml-1 text-xs text-ink-faint">({describeLimits(p)})</span>}
          {p.description && <div className="text-xs text-ink-soft">{p.description}</div>}
          {depth < 4 && (p.properties || p.items?.properties) ? <SchemaView schema={p} depth={depth + 1} /> : null}
        </li>
      ))}
    </ul>
  );
}
