// A thin bar with the ARIA progressbar role, so screen readers and tests read
// the same number the eye sees. `value` is 0..1.
export function UploadProgressBar({
  value,
  label,
  tone = "copper",
}: {
  value: number;
  label: string;
  tone?: "copper" | "good" | "bad";
}) {
  const pct = Math.round(Math.min(1, Math.max(0, Number.isFinite(value) ? value : 0)) * 100);
  const fill = tone === "good" ? "bg-good" : tone === "bad" ? "bg-bad" : "bg-copper";
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={pct}
      className="h-2 w-full min-w-20 overflow-hidden rounded-full bg-paper-sunk"
    >
      <div className={`h-full ${fill} transition-[width] duration-500`} style={{ width: `${pct}%` }} />
    </div>
  );
}
