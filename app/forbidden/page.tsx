import Link from "next/link";

export const metadata = { title: "Not allowed" };

export default function ForbiddenPage() {
  return (
    <main className="mx-auto max-w-md px-4 py-20 text-center">
      <h1 className="text-xl font-semibold">Not allowed for your role</h1>
      <p className="mt-2 text-sm text-ink-soft">
        This page belongs to another role in your organization. Ask an administrator if you need it.
      </p>
      <Link href="/" className="mt-6 inline-block text-sm text-copper-dark underline">Back to Bellows</Link>
    </main>
  );
}
