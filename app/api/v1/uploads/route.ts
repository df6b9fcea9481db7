// POST /api/v1/uploads: send a historian file with an API key; answers 202 and
// where to follow its import.
import { NextResponse } from "next/server";
import { errorResponse } from "@/lib/http";
import { authenticateApiKey } from "@/lib/services/api-keys/authenticate-api-key";
import { acceptApiUpload } from "@/lib/services/uploads/accept-api-upload";
import { BadRequest, badRequestResponse } from "../bad-request";
import { readUploadRequest } from "./read-upload-request";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function POST(req: Request) {
  try {
    const actor = await authenticateApiKey(req.headers.get("authorization"));
    const request = await readUploadRequest(req);
    const view = await acceptApiUpload(actor, request);
    return NextResponse.json({ id: view.id, status: view.status, statusUrl: `/api/v1/uploads/${view.id}`, ...(view.notice ? { notice: view.notice } : {}) }, { status: 202 });
  } catch (e) {
    if (e instanceof BadRequest) return badRequestResponse(e);
    return errorResponse(e, "POST /api/v1/uploads");
  }
}
