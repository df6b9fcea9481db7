// Status, progress and counts of one upload (the browser polls this).
import { NextResponse } from "next/server";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse } from "@/lib/http";
import { getUpload } from "@/lib/services/uploads/get-upload";
import { readUploadId } from "../read-upload-id";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(_req: Request, { params }: { params: Promise<{ id: string }> }) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    const view = await getUpload(actor, readUploadId((await params).id));
    return NextResponse.json(view, { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/uploads/[id]");
  }
}
