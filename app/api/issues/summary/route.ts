import { NextResponse } from "next/server";
import { errorResponse } from "@/lib/http";
import { getIssueSummary } from "@/lib/services/issues/get-issue-summary";
import { readSessionActor } from "../read-session-actor";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET() {
  try {
    const actor = await readSessionActor();
    return NextResponse.json(await getIssueSummary(actor), { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/issues/summary");
  }
}
