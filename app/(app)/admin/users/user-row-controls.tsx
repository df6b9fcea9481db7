"use client";

import { useTransition, useState } from "react";
import { updateUserAction } from "./actions";
import { ROLES, ROLE_LABEL, type Role } from "@/lib/auth/roles";

export function UserRowControls({ id, role, active, isSelf }: { id: number; role: Role; active: boolean; isSelf: boolean }) {
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const run = (patch: { role?: string; active?: boolean }) =>
    start(async () => {
      const r = await updateUserAction(id, patch);
      setError(r.ok ? null : r.message);
    });
  if (isSelf) return <span className="text-xs text-ink-faint">You</span>;
  return (
    <div className="flex items-center gap-2">
      <label className="sr-only" htmlFor={`role-${id}`}>Role</label>
      <select id={`role-${id}`} defaultValue={role} disabled={pending} onChange={(e) => run({ role: e.target.value })} className="field-input w-auto py-1 text-xs">
        {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABEL[r]}</option>)}
      </select>
      <button type="button" disabled={pending} onClick={() => run({ active: !active })} className="rounded border border-line px-2 py-1 text-xs hover:bg-paper-sunk">
        {active ? "Switch off" : "Switch on"}
      </button>
      {error && <span className="text-xs text-bad">{error}</span>}
    </div>
  );
}
