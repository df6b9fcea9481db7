// Acknowledge or assign several issues at once; the answer reports each id.
import { NextResponse } from "next/server";
import { errorResponse, readJson } from "@/lib/http";
import { bulkTriage } from "@/lib/services/issues/bulk-triage";
import { readSessionActor } from "../read-session-actor";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function POST(req: Request) {
  try {
    const actor = await readSessionActor();
    return NextResponse.json(await bulkTriage(actor, await readJson(req)));
  } catch (e) {
    return errorResponse(e, "POST /api/issues/bulk");
  }
}
