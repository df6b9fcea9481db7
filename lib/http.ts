// Thin helpers for route handlers: map the one error model to HTTP, and
// turn unknown errors into a generic 500 that is logged with context.
import { NextResponse } from "next/server";
import { AppError, HTTP_STATUS, isAppError } from "@/lib/errors";
import type { ZodType } from "zod";
import { fromZod } from "@/lib/errors";

export function errorResponse(e: unknown, context: string): NextResponse {
  if (isAppError(e)) {
    return NextResponse.json(
      { error: { code: e.code, message: e.message, issues: e.issues } },
      { status: HTTP_STATUS[e.code] },
    );
  }
  console.error(`[${context}]`, e);
  return NextResponse.json({ error: { code: "internal", message: "Something went wrong on our side" } }, { status: 500 });
}

export function parseOrThrow<T>(schema: ZodType<T>, input: unknown): T {
  const r = schema.safeParse(input);
  if (!r.success) throw fromZod(r.error);
  return r.data;
}

export async function readJson(req: Request): Promise<unknown> {
  try {
    return await req.json();
  } catch {
    throw new AppError("invalid", "The request body is not valid JSON");
  }
}
