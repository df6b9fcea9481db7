// Mark notifications read: {ids:[...]} or {all:true}.
import { NextResponse } from "next/server";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse, readJson } from "@/lib/http";
import { markNotificationsRead } from "@/lib/services/notifications/mark-notifications-read";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function POST(req: Request) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    return NextResponse.json(await markNotificationsRead(actor, await readJson(req)));
  } catch (e) {
    return errorResponse(e, "POST /api/notifications/read");
  }
}
