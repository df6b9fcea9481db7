// The current list view as CSV (same query string as /api/issues; every page).
import { errorResponse } from "@/lib/http";
import { exportIssuesCsv } from "@/lib/services/issues/export-issues-csv";
import { issueQueryFromSearchParams } from "@/lib/validations/issues";
import { readSessionActor } from "../read-session-actor";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(req: Request) {
  try {
    const actor = await readSessionActor();
    const lines = exportIssuesCsv(actor, issueQueryFromSearchParams(new URL(req.url).searchParams));
    // Pull the header first so a bad query answers 4xx instead of a broken download.
    const first = await lines.next();
    const enc = new TextEncoder();
    const body = new ReadableStream<Uint8Array>({
      start(c) {
        if (!first.done) c.enqueue(enc.encode(first.value));
      },
      async pull(c) {
        const n = await lines.next();
        if (n.done) c.close();
        else c.enqueue(enc.encode(n.value));
      },
    });
    const stamp = new Date().toISOString().slice(0, 10);
    return new Response(body, {
      headers: {
        "Content-Type": "text/csv; charset=utf-8",
        "Content-Disposition": `attachment; filename="bellows-issues-${stamp}.csv"`,
        "Cache-Control": "no-store",
      },
    });
  } catch (e) {
    return errorResponse(e, "GET /api/issues/export.csv");
  }
}
