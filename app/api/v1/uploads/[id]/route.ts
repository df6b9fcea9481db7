// GET /api/v1/uploads/{id}: status, progress and counts of one upload.
import { NextResponse } from "next/server";
import { errorResponse, parseOrThrow } from "@/lib/http";
import { authenticateApiKey } from "@/lib/services/api-keys/authenticate-api-key";
import { getUpload } from "@/lib/services/uploads/get-upload";
import { UploadIdSchema } from "@/lib/validations/uploads";
import { toApiUploadStatus } from "../to-api-upload-status";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(req: Request, { params }: { params: Promise<{ id: string }> }) {
  try {
    const actor = await authenticateApiKey(req.headers.get("authorization"));
    const id = parseOrThrow(UploadIdSchema, (await params).id);
    return NextResponse.json(toApiUploadStatus(await getUpload(actor, id)), { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/v1/uploads/[id]");
  }
}
