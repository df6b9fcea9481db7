// Session-authenticated upload endpoints for the browser.
// POST streams the request body straight to the uploads service, so a file of
// hundreds of MB never sits in this process's memory; the name travels in the
// x-file-name header (URI-encoded, headers are ASCII) or the ?name= query.
// GET lists the organization's uploads with progress for the history table.
import { NextResponse } from "next/server";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse, parseOrThrow } from "@/lib/http";
import { receiveUpload } from "@/lib/services/uploads/receive-upload";
import { listUploads } from "@/lib/services/uploads/list-uploads";
import { ListUploadsSchema } from "@/lib/validations/uploads";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";


function readFileName(req: Request): string {
  const raw = req.headers.get("x-file-name") ?? new URL(req.url).searchParams.get("name") ?? "";
  let name = raw;
  try {
    name = decodeURIComponent(raw);
  } catch {
    // A name that is not valid URI encoding is used as sent.
  }
  if (!name.trim()) throw new AppError("invalid", "Send the file name in the x-file-name header", [{ path: "fileName", message: "missing" }]);
  return name;
}

export async function POST(req: Request) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    const fileName = readFileName(req);
    if (!req.body) throw new AppError("invalid", "The request has no file in its body");
    const view = await receiveUpload(actor, { fileName, body: req.body, source: "browser" });
    return NextResponse.json(view, { status: 201 });
  } catch (e) {
    return errorResponse(e, "POST /api/uploads");
  }
}

export async function GET(req: Request) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    const sp = new URL(req.url).searchParams;
    const q = parseOrThrow(ListUploadsSchema, { limit: sp.get("limit") ?? undefined, offset: sp.get("offset") ?? undefined });
    const uploads = await listUploads(actor, q);
    return NextResponse.json(uploads, { headers: { "Cache-Control": "no-store" } });
  } catch (e) {
    return errorResponse(e, "GET /api/uploads");
  }
}
