// Make sure the monthly partitions of `sample_blocks` exist for a time range before a
// write, outside the write's transaction: creating a partition takes a strong lock
// on the parent, which must not be held while rows are being upserted.
import type pg from "pg";

// Months known to exist in this process (UTC month start, epoch ms).
const known = new Set<number>();

function monthStart(t: number): number {
  const d = new Date(t);
  return Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), 1);
}

function nextMonth(m: number): number {
  const d = new Date(m);
  return Date.UTC(d.getUTCFullYear(), d.getUTCMonth() + 1, 1);
}

// Partitions are made only for plausible times; a stray timestamp far in the past or
// future lands in the DEFAULT partition instead of creating hundreds of empty months.
const EARLIEST = Date.UTC(1990, 0, 1);
const AHEAD_MS = 366 * 24 * 3600 * 1000;
const DUPLICATE_TABLE = "42P07";
const UNIQUE_VIOLATION = "23505";

export async function ensureSamplePartitions(client: pg.ClientBase, fromRaw: number, toRaw: number): Promise<void> {
  const fromMs = Math.max(fromRaw, EARLIEST);
  const toMs = Math.min(toRaw, Date.now() + AHEAD_MS);
  if (!(fromMs <= toMs)) return;
  let isMissing = false;
  for (let m = monthStart(fromMs); m <= toMs; m = nextMonth(m)) {
    if (!known.has(m)) { isMissing = true; break; }
  }
  if (!isMissing) return;
  // Two sessions may both find a month missing: the SQL function serialises them on an
  // advisory lock, but the second can still miss the first's new table in its catalog
  // snapshot and fail creating it (duplicate table, or a duplicate catalog key). The
  // table exists by then, so asking again succeeds.
  for (let attempt = 1; ; attempt++) {
    try {
      await client.query("SELECT bellows_ensure_sample_partitions($1, $2)", [new Date(fromMs), new Date(toMs)]);
      break;
    } catch (e) {
      const code = (e as { code?: string }).code;
      if (attempt >= 3 || (code !== DUPLICATE_TABLE && code !== UNIQUE_VIOLATION)) throw e;
    }
  }
  for (let m = monthStart(fromMs); m <= toMs; m = nextMonth(m)) known.add(m);
}

/** For tests that rebuild the schema inside one process. */
export function forgetKnownPartitions(): void {
  known.clear();
}
