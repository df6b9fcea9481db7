// A 400 for requests the API cannot even read (wrong content type, no file part).
// Problems with readable input are 422s from the services (lib/errors.ts).
import { NextResponse } from "next/server";

export class BadRequest extends Error {}

export function badRequestResponse(e: BadRequest): NextResponse {
  return NextResponse.json({ error: { code: "bad_request", message: e.message, issues: [] } }, { status: 400 });
}
