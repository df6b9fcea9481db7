// The refused rows of one upload as a CSV download (row, column, raw text,
// reason, message), streamed from storage rather than read into memory.
import { Readable } from "node:stream";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse } from "@/lib/http";
import { openRejections } from "@/lib/services/uploads/open-rejections";
import { readUploadId } from "../../read-upload-id";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

function toWebStream(s: ReadableStream<Uint8Array> | NodeJS.ReadableStream): ReadableStream<Uint8Array> {
  if (typeof (s as ReadableStream<Uint8Array>).getReader === "function") return s as ReadableStream<Uint8Array>;
  return Readable.toWeb(s as Readable) as ReadableStream<Uint8Array>;
}

export async function GET(_req: Request, { params }: { params: Promise<{ id: string }> }) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    const id = readUploadId((await params).id);
    const opened = await openRejections(actor, id);
    return new Response(toWebStream(opened), {
      headers: {
        "Content-Type": "text/csv; charset=utf-8",
        "Content-Disposition": `attachment; filename="upload-${id}-rejected-rows.csv"`,
        "Cache-Control": "no-store",
      },
    });
  } catch (e) {
    return errorResponse(e, "GET /api/uploads/[id]/rejections");
  }
}
