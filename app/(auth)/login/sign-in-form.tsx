"use client";

import { signIn } from "next-auth/react";
import { useState } from "react";
import Link from "next/link";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    const form = new FormData(e.currentTarget);
    const res = await signIn("credentials", {
      email: String(form.get("email") ?? ""),
      password: String(form.get("password") ?? ""),
      redirect: false,
    });
    setBusy(false);
    if (res?.error) {
      setError(res.error === "CredentialsSignin" ? "E-mail or password is not right" : res.error);
      return;
    }
    // Only same-site paths are followed after sign-in.
    window.location.href = callbackUrl.startsWith("/") ? callbackUrl : "/";
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3" noValidate>
      <div>
        <label htmlFor="email" className="field-label">E-mail</label>
        <input id="email" name="email" type="email" autoComplete="username" required className="field-input" />
      </div>
      <div>
        <label htmlFor="password" className="field-label">Password</label>
        <input id="password" name="password" type="password" autoComplete="current-password" required className="field-input" />
      </div>
      {error && <p role="alert" className="field-error text-sm">{error}</p>}
      <button type="submit" disabled={busy} className="w-full rounded bg-ink px-3 py-2 text-sm font-medium text-paper hover:bg-ink/90 disabled:opacity-60">
        {busy ? "Signing in…" : "Sign in"}
      </button>
      <p className="text-center text-xs">
        <Link href="/forgot" className="text-copper-dark underline">Forgot your password?</Link>
      </p>
    </form>
  );
}
