import type { Mapping } from "@/lib/ingest/mapping";
import type { SavedMapping } from "@/models";

export interface MappingView {
  id: number;
  name: string;
  headerShape: string;
  layout: "long" | "wide";
  mapping: Mapping;
  updatedAt: string;
}

export function toMappingView(m: SavedMapping): MappingView {
  return { id: m.id, name: m.name, headerShape: m.header_shape, layout: m.layout, mapping: m.definition as Mapping, updatedAt: m.updated_at.toISOString() };
}
