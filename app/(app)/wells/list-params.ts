// Reading the register's URL (?q=&fieldId=&padId=&status=&sort=&dir=) into a
// valid filter. A hand-edited or stale URL must not break the page: values
// that do not validate are dropped one by one and reported.
import { WellFilterSchema, type WellFilter } from "@/lib/validations/well";

export type RawSearchParams = Record<string, string | string[] | undefined>;

const KEYS = ["q", "fieldId", "padId", "status", "sort", "dir"] as const;

export function readWellFilter(sp: RawSearchParams): { filter: WellFilter; ignored: string[] } {
  const raw: Record<string, string> = {};
  for (const k of KEYS) {
    const v = Array.isArray(sp[k]) ? sp[k][0] : sp[k];
    if (typeof v === "string" && v.trim() !== "") raw[k] = v;
  }
  const ignored: string[] = [];
  let r = WellFilterSchema.safeParse(raw);
  while (!r.success) {
    const bad = String(r.error.issues[0]?.path[0] ?? "");
    if (!bad || !(bad in raw)) return { filter: WellFilterSchema.parse({}), ignored: Object.keys(raw) };
    ignored.push(bad);
    delete raw[bad];
    r = WellFilterSchema.safeParse(raw);
  }
  return { filter: r.data, ignored };
}

/** The URL of the register with these filter values, dropping defaults and blanks. */
export function wellListHref(filter: Partial<WellFilter>): string {
  const qs = new URLSearchParams();
  for (const k of KEYS) {
    const v = filter[k];
    if (v === undefined || v === null || v === "") continue;
    if (k === "sort" && v === "name" && filter.dir !== "desc") continue;
    if (k === "dir" && v === "asc") continue;
    qs.set(k, String(v));
  }
  const s = qs.toString();
  return s ? `/wells?${s}` : "/wells";
}
