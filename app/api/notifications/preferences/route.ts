// The signed-in person's e-mail notification choices (read and replace).
import { NextResponse } from "next/server";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse, readJson } from "@/lib/http";
import { getNotificationPreferences } from "@/lib/services/notifications/get-notification-preferences";
import { saveNotificationPreferences } from "@/lib/services/notifications/save-notification-preferences";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

async function actorOr401() {
  const actor = await getActor();
  if (!actor) throw new AppError("unauthenticated", "Please sign in");
  return actor;
}

export async function GET() {
  try {
    return NextResponse.json(await getNotificationPreferences(await actorOr401()), { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/notifications/preferences");
  }
}

export async function PUT(req: Request) {
  try {
    const actor = await actorOr401();
    return NextResponse.json(await saveNotificationPreferences(actor, await readJson(req)));
  } catch (e) {
    return errorResponse(e, "PUT /api/notifications/preferences");
  }
}
