// A small inline-SVG line of open issues per day (no chart library needed).
export function IssueSparkline({ points, label }: { points: { day: string; open: number }[]; label: string }) {
  const w = 240;
  const h = 48;
  const max = Math.max(1, ...points.map((p) => p.open));
  const step = points.length > 1 ? w / (points.length - 1) : w;
  const xy = points.map((p, i) => `${(i * step).toFixed(1)},${(h - 4 - (p.open / max) * (h - 8)).toFixed(1)}`);
  const last = points.at(-1);
  return (
    <figure className="m-0">
      <svg viewBox={`0 0 ${w} ${h}`} preserveAspectRatio="none" height={h} role="img" aria-label={label} className="block w-full max-w-60">
        <polyline points={xy.join(" ")} fill="none" stroke="#b4652b" strokeWidth={1.8} strokeLinejoin="round" vectorEffect="non-scaling-stroke" />
        {last && <circle cx={(points.length - 1) * step} cy={h - 4 - (last.open / max) * (h - 8)} r={2.5} fill="#b4652b" />}
      </svg>
      <figcaption className="text-xs text-ink-soft">
        {points[0]?.day} → {last?.day}: now {last?.open ?? 0} open (max {max})
      </figcaption>
    </figure>
  );
}
