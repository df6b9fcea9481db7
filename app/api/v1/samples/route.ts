// POST /api/v1/samples: a JSON batch of values (at most 10 000 per call).
import { NextResponse } from "next/server";
import { errorResponse, readJson } from "@/lib/http";
import { authenticateApiKey } from "@/lib/services/api-keys/authenticate-api-key";
import { ingestSamples } from "@/lib/services/samples/ingest-samples";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function POST(req: Request) {
  try {
    const actor = await authenticateApiKey(req.headers.get("authorization"));
    return NextResponse.json(await ingestSamples(actor, await readJson(req)));
  } catch (e) {
    return errorResponse(e, "POST /api/v1/samples");
  }
}
