import { Wordmark } from "@/components/logo";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="flex min-h-screen flex-col items-center justify-center px-4 py-10">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex justify-center">
          <Wordmark />
        </div>
        <div className="rounded-lg border border-line bg-paper-raised p-6 shadow-sm">{children}</div>
        <p className="mt-6 text-center text-xs text-ink-faint">Gas-lift surveillance by exception</p>
      </div>
    </main>
  );
}
