// The trend route's query string, validated: ?from&to (epoch ms or ISO 8601),
// &width (chart pixels) and &signals (comma-separated signal keys).
import { z } from "zod";
import { SIGNALS, type Signal } from "@/lib/signals";

const instant = z
  .string()
  .trim()
  .min(1)
  .transform((s, ctx) => {
    const ms = /^-?\d+(\.\d+)?$/.test(s) ? Number(s) : Date.parse(s);
    if (!Number.isFinite(ms)) {
      ctx.addIssue({ code: "custom", message: "must be epoch milliseconds or an ISO 8601 time" });
      return z.NEVER;
    }
    return Math.round(ms);
  });

const signalList = z
  .string()
  .trim()
  .transform((s, ctx) => {
    const keys = s.split(",").map((k) => k.trim()).filter(Boolean);
    const bad = keys.filter((k) => !(SIGNALS as readonly string[]).includes(k));
    if (bad.length > 0) {
      ctx.addIssue({ code: "custom", message: `unknown signal: ${bad.join(", ")}` });
      return z.NEVER;
    }
    return keys as Signal[];
  });

export const TrendQuerySchema = z
  .object({
    from: instant,
    to: instant,
    width: z.coerce.number().int().min(50).max(8000).optional(),
    signals: signalList.optional(),
  })
  .refine((q) => q.from < q.to, { path: ["to"], message: "must be after from" });

export type TrendQuery = z.infer<typeof TrendQuerySchema>;

/** URLSearchParams → plain object for the schema (missing keys stay missing). */
export function readTrendSearchParams(sp: URLSearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of ["from", "to", "width", "signals"]) {
    const v = sp.get(key);
    if (v !== null && v !== "") out[key] = v;
  }
  return out;
}
