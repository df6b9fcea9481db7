"use client";
// Create a key and show it once. Only its hash is stored, so this is the one
// moment anyone can copy it; the warning says so plainly.
import { useState, useTransition } from "react";
import type { CreatedApiKey } from "@/lib/services/api-keys/create-api-key";
import { createApiKeyAction } from "./actions";

export function ApiKeyCreateForm() {
  const [name, setName] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [created, setCreated] = useState<(CreatedApiKey & { name: string }) | null>(null);
  const [copied, setCopied] = useState(false);
  const [isPending, startTransition] = useTransition();

  function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    startTransition(async () => {
      const r = await createApiKeyAction(name);
      if (!r.ok) {
        setError(r.issues[0]?.message ?? r.message);
        return;
      }
      setCreated({ ...r.data, name: name.trim() });
      setCopied(false);
      setName("");
    });
  }

  async function copy() {
    if (!created) return;
    try {
      await navigator.clipboard.writeText(created.key);
      setCopied(true);
    } catch {
      setCopied(false);
      setError("The browser did not allow copying; select the key and copy it by hand.");
    }
  }

  return (
    <div className="space-y-3">
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3 rounded border border-line bg-paper-raised p-3">
        <div className="min-w-56 flex-1">
          <label htmlFor="key-name" className="field-label">Key name (what will use it)</label>
          <input
            id="key-name"
            className="field-input"
            maxLength={120}
            value={name}
            onChange={(e) => setName(e.target.value)}
            placeholder="e.g. Nightly historian export"
            aria-invalid={!!error}
            aria-describedby={error ? "key-name-error" : undefined}
          />
          {error && <p id="key-name-error" className="field-error">{error}</p>}
        </div>
        <button type="submit" disabled={isPending} className="rounded bg-ink px-3 py-1.5 text-sm font-medium text-paper hover:bg-ink/90 disabled:opacity-50">
          {isPending ? "Creating…" : "Create key"}
        </button>
      </form>

      {created && (
        <div className="space-y-2 rounded border border-warn/50 bg-warn/10 p-3" role="status" data-testid="new-api-key">
          <p className="text-sm font-semibold">Key “{created.name}” created. Copy it now: it will not be shown again.</p>
          <div className="flex flex-wrap items-center gap-2">
            <code className="min-w-0 flex-1 select-all break-all rounded border border-line bg-paper-raised px-2 py-1.5 font-mono text-sm" data-testid="new-api-key-value">
              {created.key}
            </code>
            <button type="button" onClick={copy} className="rounded border border-line bg-paper-raised px-3 py-1.5 text-sm hover:bg-paper-sunk">
              {copied ? "Copied" : "Copy key"}
            </button>
          </div>
          <p className="text-xs text-ink-soft">Send it in the Authorization header as “Bearer &lt;key&gt;”. Anyone holding it can send data for your organization; revoke it if it leaks.</p>
          <button type="button" onClick={() => setCreated(null)} className="text-xs text-ink-soft underline">I have stored the key; hide it</button>
        </div>
      )}
    </div>
  );
}
