// The ranked issue list for the table: sorting, filters and paging in the query string.
import { NextResponse } from "next/server";
import { errorResponse } from "@/lib/http";
import { listRankedIssues } from "@/lib/services/issues/list-ranked-issues";
import { issueQueryFromSearchParams } from "@/lib/validations/issues";
import { readSessionActor } from "./read-session-actor";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(req: Request) {
  try {
    const actor = await readSessionActor();
    const result = await listRankedIssues(actor, issueQueryFromSearchParams(new URL(req.url).searchParams));
    return NextResponse.json(result, { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/issues");
  }
}
