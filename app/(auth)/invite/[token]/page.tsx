import Link from "next/link";
import { describeToken } from "@/lib/services/auth/set-password-with-token";
import { SetPasswordForm } from "@/components/set-password-form";

export const dynamic = "force-dynamic";
export const metadata = { title: "Welcome to Bellows" };

export default async function Page({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const info = await describeToken(token);
  return (
    <>
      <h1 className="mb-4 text-lg font-semibold">Welcome to Bellows</h1>
      {info ? (
        <SetPasswordForm token={token} email={info.email} submitLabel="Set password and join" />
      ) : (
        <p className="text-sm text-bad">
          This link has expired or was already used. <Link href="/forgot" className="underline">Ask for a new one</Link>.
        </p>
      )}
    </>
  );
}
