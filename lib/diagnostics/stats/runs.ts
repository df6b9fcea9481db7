// Turn a per-bin boolean flag into runs [startBin, endBin), bridging short holes.

export interface Run {
  from: number;
  to: number;
}

/** Runs of true in `flags` at least `minLength` long, joining runs separated by ≤ `bridge` false bins. */
export function findRuns(flags: Uint8Array, minLength: number, bridge = 0): Run[] {
  const raw: Run[] = [];
  let start = -1;
  for (let i = 0; i <= flags.length; i++) {
    const on = i < flags.length && flags[i] === 1;
    if (on && start < 0) start = i;
    if (!on && start >= 0) { raw.push({ from: start, to: i }); start = -1; }
  }
  const joined: Run[] = [];
  for (const r of raw) {
    const last = joined[joined.length - 1];
    if (last && r.from - last.to <= bridge) last.to = r.to;
    else joined.push({ ...r });
  }
  return joined.filter((r) => r.to - r.from >= minLength);
}
