// Readable reference of the public API, rendered on the server from the same
// OpenAPI document served at /api/v1/openapi.json.
import type { Metadata } from "next";
import { requirePageActor } from "@/lib/auth/session";
import { buildOpenApiDocument } from "@/lib/validations/openapi-document";
import { SchemaView, describeType } from "./schema-view";

export const metadata: Metadata = { title: "API reference" };

type Json = Record<string, unknown>;
type Operation = {
  summary?: string;
  description?: string;
  parameters?: { name: string; in: string; required?: boolean; description?: string; schema?: Json }[];
  requestBody?: { content?: Record<string, { schema?: Json }> };
  responses?: Record<string, { description?: string; content?: Record<string, { schema?: Json }> }>;
};

export default async function ApiDocsPage() {
  await requirePageActor();
  const doc = buildOpenApiDocument();
  const paths = Object.entries(doc.paths ?? {}) as [string, Record<string, Operation>][];
  return (
    <div className="max-w-4xl space-y-6">
      <header className="space-y-2">
        <h1 className="text-lg font-semibold">{doc.info.title}</h1>
        <p className="text-sm text-ink-soft">{doc.info.description}</p>
        <p className="text-sm">
          Machine-readable: <a className="text-copper-dark underline" href="/api/v1/openapi.json">/api/v1/openapi.json</a> (OpenAPI {doc.openapi}).
          Send <code>Authorization: Bearer blw_…</code> with every call.
        </p>
      </header>
      {paths.map(([path, ops]) =>
        Object.entries(ops).map(([method, op]) => (
          <section key={`${method} ${path}`} className="rounded border border-line bg-paper-raised p-4" aria-label={`${method.toUpperCase()} ${path}`}>
            <h2 className="font-mono text-sm font-semibold">
              <span className="mr-2 rounded bg-ink px-1.5 py-0.5 text-paper">{method.toUpperCase()}</span>
              {path}
            </h2>
            {op.summary && <p className="mt-2 font-medium">{op.summary}</p>}
            {op.description && <p className="mt-1 text-sm text-ink-soft">{op.description}</p>}
            {op.parameters && op.parameters.length > 0 && (
              <div className="mt-3">
                <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Parameters</h3>
                <ul>
                  {op.parameters.map((p) => (
                    <li key={`${p.in}-${p.name}`} className="text-sm">
                      <code className="font-medium">{p.name}</code> <span className="text-ink-soft">in {p.in}, {p.schema ? describeType(p.schema) : "string"}</span>
                      {p.required ? <span className="ml-1 text-xs text-copper-dark">required</span> : null}
                      {(p.description ?? (p.schema?.description as string | undefined)) && (
                        <span className="text-xs text-ink-soft"> — {p.description ?? (p.schema?.description as string)}</span>
                      )}
                    </li>
                  ))}
                </ul>
              </div>
            )}
            {op.requestBody?.content && (
              <div className="mt-3 space-y-2">
                <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Request body</h3>
                {Object.entries(op.requestBody.content).map(([type, c]) => (
                  <div key={type}>
                    <p className="text-xs text-ink-soft">{type}</p>
                    {c.schema && <SchemaView schema={c.schema} />}
                  </div>
                ))}
              </div>
            )}
            <div className="mt-3 space-y-2">
              <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Responses</h3>
              {Object.entries(op.responses ?? {}).map(([status, r]) => (
                <div key={status}>
                  <p className="text-sm"><code className="font-semibold">{status}</code> {r.description}</p>
                  {status.startsWith("2") && r.content?.["application/json"]?.schema && <SchemaView schema={r.content["application/json"].schema} />}
                </div>
              ))}
            </div>
          </section>
        )),
      )}
      <section className="rounded border border-line bg-paper-raised p-4">
        <h2 className="font-semibold">Mapping</h2>
        <p className="mb-2 text-sm text-ink-soft">How the columns or tags of a file become wells and signals (the inline <code>mappingJson</code>).</p>
        <SchemaView schema={(doc.components?.schemas?.Mapping ?? {}) as Json} />
      </section>
    </div>
  );
}
