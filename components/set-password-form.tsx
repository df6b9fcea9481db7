"use client";

import { useActionState } from "react";
import Link from "next/link";
import { setPasswordAction } from "@/app/(auth)/actions";

export function SetPasswordForm({ token, email, submitLabel }: { token: string; email: string; submitLabel: string }) {
  const [state, action, pending] = useActionState(setPasswordAction, null);
  if (state?.ok) {
    return (
      <p role="status" className="text-sm text-good">
        Your password is set. <Link href="/login?done=password" className="underline">Sign in</Link>
      </p>
    );
  }
  const issue = (p: string) => state?.issues.find((i) => i.path === p)?.message;
  return (
    <form action={action} className="space-y-3">
      <input type="hidden" name="token" value={token} />
      <p className="text-sm text-ink-soft">Account: <strong>{email}</strong></p>
      <div>
        <label htmlFor="password" className="field-label">New password (at least 10 characters)</label>
        <input id="password" name="password" type="password" autoComplete="new-password" required className="field-input" />
        {issue("password") && <p className="field-error">{issue("password")}</p>}
      </div>
      <div>
        <label htmlFor="confirm" className="field-label">Repeat the password</label>
        <input id="confirm" name="confirm" type="password" autoComplete="new-password" required className="field-input" />
        {issue("confirm") && <p className="field-error">{issue("confirm")}</p>}
      </div>
      {state && !state.ok && <p role="alert" className="text-sm text-bad">{state.message}</p>}
      <button type="submit" disabled={pending} className="w-full rounded bg-ink px-3 py-2 text-sm font-medium text-paper disabled:opacity-60">{submitLabel}</button>
    </form>
  );
}
