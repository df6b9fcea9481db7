// One issue photo, after the organization and role checks (never a public URL).
import { Readable } from "node:stream";
import { errorResponse } from "@/lib/http";
import { openPhoto } from "@/lib/services/issues/open-photo";
import { readSessionActor } from "../../../read-session-actor";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(_req: Request, { params }: { params: Promise<{ id: string; photoId: string }> }) {
  try {
    const actor = await readSessionActor();
    const p = await params;
    const photo = await openPhoto(actor, Number(p.id), Number(p.photoId));
    return new Response(Readable.toWeb(photo.body) as ReadableStream<Uint8Array>, {
      headers: {
        "Content-Type": photo.contentType,
        "Content-Length": String(photo.byteSize),
        "Content-Disposition": `inline; filename="${photo.fileName.replace(/"/g, "")}"`,
        "X-Content-Type-Options": "nosniff",
        "Cache-Control": "private, max-age=300",
      },
    });
  } catch (e) {
    return errorResponse(e, "GET /api/issues/[id]/photos/[photoId]");
  }
}
