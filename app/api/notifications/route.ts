// The bell: unread count and the latest notifications of the signed-in person.
import { NextResponse } from "next/server";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse } from "@/lib/http";
import { listNotifications } from "@/lib/services/notifications/list-notifications";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET() {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    return NextResponse.json(await listNotifications(actor), { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/notifications");
  }
}
