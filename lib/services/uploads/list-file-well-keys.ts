// The well keys a file's head names under a mapping: from the distinct tags seen
// (long layout), the well column of the preview rows, or the one chosen well.
import type { Mapping } from "@/lib/ingest/mapping";
import { createTagResolver } from "@/lib/ingest/resolve-tag";
import { normaliseHeaderName } from "@/lib/ingest/header-shape";
import type { Detection } from "@/lib/ingest/types";

export function listFileWellKeys(detection: Detection, mapping: Mapping | null): string[] {
  const keys = new Set<string>();
  if (mapping?.layout === "long" && mapping.long) {
    const resolve = createTagResolver(mapping.long.tags);
    for (const tag of detection.tagValues ?? []) {
      const r = resolve(tag);
      if (r) keys.add(r.wellKey.trim());
    }
  } else if (mapping?.layout === "wide" && mapping.wide) {
    if (mapping.wide.wellColumn) {
      const i = detection.columns.map(normaliseHeaderName).indexOf(normaliseHeaderName(mapping.wide.wellColumn));
      if (i >= 0) for (const row of detection.preview) if (row[i]?.trim()) keys.add(row[i].trim());
    } else if (mapping.wide.wellKey) keys.add(mapping.wide.wellKey.trim());
  }
  return [...keys];
}
