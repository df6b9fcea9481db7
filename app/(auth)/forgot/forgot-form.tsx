"use client";

import { useActionState } from "react";
import Link from "next/link";
import { requestResetAction } from "../actions";

export function ForgotForm() {
  const [state, action, pending] = useActionState(requestResetAction, null);
  return (
    <form action={action} className="space-y-3">
      <div>
        <label htmlFor="email" className="field-label">E-mail</label>
        <input id="email" name="email" type="email" required className="field-input" />
        {state?.issues.find((i) => i.path === "email") && <p className="field-error">{state.issues.find((i) => i.path === "email")?.message}</p>}
      </div>
      {state && <p role="status" className={`text-sm ${state.ok ? "text-good" : "text-bad"}`}>{state.message}</p>}
      <button type="submit" disabled={pending} className="w-full rounded bg-ink px-3 py-2 text-sm font-medium text-paper disabled:opacity-60">Send reset link</button>
      <p className="text-center text-xs"><Link href="/login" className="text-copper-dark underline">Back to sign in</Link></p>
    </form>
  );
}
