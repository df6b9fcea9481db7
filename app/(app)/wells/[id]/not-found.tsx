import Link from "next/link";

export default function WellNotFound() {
  return (
    <div className="space-y-2 py-8 text-center">
      <h1 className="text-lg font-semibold">Well not found</h1>
      <p className="text-sm text-ink-soft">There is no such well in your organization&apos;s register.</p>
      <Link href="/wells" className="text-sm text-copper-dark underline">Back to the wells</Link>
    </div>
  );
}
