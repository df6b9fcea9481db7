"use client";
// Revoke asks first: programs using the key stop at once and cannot be undone.
import { useState, useTransition } from "react";
import { revokeApiKeyAction } from "./actions";

export function ApiKeyRevokeButton({ id, name }: { id: number; name: string }) {
  const [error, setError] = useState<string | null>(null);
  const [isPending, startTransition] = useTransition();
  return (
    <>
      <button
        type="button"
        disabled={isPending}
        className="rounded border border-bad/40 px-2 py-1 text-xs text-bad hover:bg-bad/10 disabled:opacity-50"
        onClick={() => {
          if (!window.confirm(`Revoke the key “${name}”? Programs using it will be refused from now on. This cannot be undone.`)) return;
          setError(null);
          startTransition(async () => {
            const r = await revokeApiKeyAction(id);
            if (!r.ok) setError(r.message);
          });
        }}
      >
        {isPending ? "Revoking…" : "Revoke"}
      </button>
      {error && <p className="field-error" role="alert">{error}</p>}
    </>
  );
}
