import type { Metadata } from "next";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function LoginPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; done?: string }> }) {
  const sp = await searchParams;
  return (
    <>
      <h1 className="mb-4 text-lg font-semibold">Sign in</h1>
      {sp.done === "password" && (
        <p className="mb-3 rounded bg-good/10 px-2 py-1 text-sm text-good">Your password is set. Sign in with it now.</p>
      )}
      <SignInForm callbackUrl={sp.callbackUrl ?? "/"} />
    </>
  );
}
