// Pad-wide events found by the diagnosis (e.g. every well losing injection at once)
// become one field_events row each, not an issue per well. A re-run finds the row it
// made before by overlap (pad, kind and time) and only writes what really changed.
import { Op } from "sequelize";
import { FieldEvent } from "@/models";
import type { FieldEvent as EngineFieldEvent } from "@/lib/diagnostics/types";

export interface FieldEventCounts {
  created: number;
  updated: number;
}

const KIND_WORDS: Record<string, string> = {
  injection_outage: "lost injection gas at the same time (a supply or compressor outage, not a problem of each well)",
};

export async function upsertFieldEvents(organizationId: number, padId: number, padWellCount: number, events: EngineFieldEvent[], ranUntil: number): Promise<FieldEventCounts> {
  const counts: FieldEventCounts = { created: 0, updated: 0 };
  for (const e of events) {
    const wellCount = e.wellIds?.length ?? 0;
    // The engine pads the window for the recovery; past the end of the data it is still going on.
    const endedAt = e.end > ranUntil ? null : new Date(e.end);
    const summary = `${wellCount} of ${padWellCount} wells on this pad ${KIND_WORDS[e.kind] ?? `took part in a pad-wide event (${e.kind})`}.`;
    const existing = await FieldEvent.findOne({
      where: {
        organization_id: organizationId,
        pad_id: padId,
        kind: e.kind,
        started_at: { [Op.lte]: new Date(e.end) },
        [Op.or]: [{ ended_at: null }, { ended_at: { [Op.gte]: new Date(e.start) } }],
      },
      order: [["started_at", "ASC"]],
    });
    if (!existing) {
      await FieldEvent.create({ organization_id: organizationId, pad_id: padId, kind: e.kind, started_at: new Date(e.start), ended_at: endedAt, well_count: wellCount, summary });
      counts.created++;
      continue;
    }
    const patch: Partial<{ ended_at: Date | null; well_count: number; summary: string }> = {};
    const storedEnd = existing.ended_at?.getTime() ?? null;
    if (endedAt && (storedEnd === null || endedAt.getTime() > storedEnd)) patch.ended_at = endedAt;
    // Still going at the end of data that reaches past the stored end: open again.
    if (!endedAt && storedEnd !== null && ranUntil >= storedEnd) patch.ended_at = null;
    if (wellCount > existing.well_count) {
      patch.well_count = wellCount;
      patch.summary = summary;
    }
    if (Object.keys(patch).length) {
      await existing.update(patch);
      counts.updated++;
    }
  }
  return counts;
}
