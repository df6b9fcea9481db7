// A well's reduced trend with its overlays, for the chart (GET ?from&to&width&signals).
import { getActor } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/errors";
import { errorResponse, parseOrThrow } from "@/lib/http";
import { TrendQuerySchema, readTrendSearchParams } from "@/lib/trends/trend-query";
import { getTrendData } from "@/lib/services/trends/get-trend-data";
import { serializeTrendData } from "@/lib/trends/serialize-trend-data";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(req: Request, { params }: { params: Promise<{ id: string }> }) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    const raw = (await params).id;
    if (!/^\d{1,10}$/.test(raw)) throw notFound("Well not found");
    const query = parseOrThrow(TrendQuerySchema, readTrendSearchParams(new URL(req.url).searchParams));
    const data = await getTrendData(actor, Number(raw), query);
    // Pre-encoded bytes: a repeated chart reuses its series' encoding (serialize-trend-data.ts).
    return new Response(serializeTrendData(data), {
      headers: { "Content-Type": "application/json", "Cache-Control": "private, no-store" },
    });
  } catch (e) {
    return errorResponse(e, "GET /api/wells/[id]/trends");
  }
}
