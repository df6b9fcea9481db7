import type { Metadata } from "next";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/session";
import { listApiKeys } from "@/lib/services/api-keys/list-api-keys";
import { ApiKeyCreateForm } from "./api-key-create-form";
import { ApiKeyRevokeButton } from "./api-key-revoke-button";

export const metadata: Metadata = { title: "API keys" };

/** UTC on the server: the page renders once, for whoever reads it. */
function formatUtc(iso: string | null): string {
  if (!iso) return "—";
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}

export default async function ApiKeysPage() {
  const actor = await requirePageActor("apikeys.manage");
  const keys = await listApiKeys(actor);
  return (
    <div className="max-w-4xl space-y-5">
      <div className="space-y-1">
        <h1 className="text-lg font-semibold">API keys</h1>
        <p className="text-sm text-ink-soft">
          A key lets a program (a scheduled historian export, a script) send files and read results for your organization
          without a person signing in. See the <Link href="/api-docs" className="text-copper-dark underline">API documentation</Link>.
        </p>
      </div>

      <ApiKeyCreateForm />

      <div className="overflow-x-auto rounded border border-line bg-paper-raised">
        <table className="data-table w-full" data-testid="api-key-table">
          <caption className="sr-only">API keys of the organization</caption>
          <thead>
            <tr>
              <th scope="col">Name</th>
              <th scope="col">Starts with</th>
              <th scope="col">Created</th>
              <th scope="col">Last used</th>
              <th scope="col">Revoked</th>
              <th scope="col"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {keys.length === 0 && (
              <tr><td colSpan={6} className="text-ink-soft">No keys yet.</td></tr>
            )}
            {keys.map((k) => (
              <tr key={k.id} data-testid="api-key-row" data-key-name={k.name} className={k.revokedAt ? "text-ink-faint" : ""}>
                <td className="font-medium">{k.name}</td>
                <td className="font-mono text-xs">{k.prefix}…</td>
                <td className="whitespace-nowrap">{formatUtc(k.createdAt)}</td>
                <td className="whitespace-nowrap">{k.lastUsedAt ? formatUtc(k.lastUsedAt) : "never"}</td>
                <td className="whitespace-nowrap" data-testid="api-key-revoked">{k.revokedAt ? formatUtc(k.revokedAt) : "—"}</td>
                <td className="text-right">{!k.revokedAt && <ApiKeyRevokeButton id={k.id} name={k.name} />}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
