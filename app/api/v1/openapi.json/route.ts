// GET /api/v1/openapi.json: the public API described as OpenAPI 3 (no key needed).
import { NextResponse } from "next/server";
import { errorResponse } from "@/lib/http";
import { buildOpenApiDocument } from "@/lib/validations/openapi-document";

export const runtime = "nodejs";

export function GET() {
  try {
    return NextResponse.json(buildOpenApiDocument(), { headers: { "Cache-Control": "public, max-age=300" } });
  } catch (e) {
    return errorResponse(e, "GET /api/v1/openapi.json");
  }
}
