// One error model for the whole app. Services throw AppError; route handlers
// and actions map it to HTTP (or to a form message) through one table.
import type { ZodError } from "zod";

export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "invalid"
  | "conflict"
  | "rate_limited"
  | "unavailable"
  | "too_large"
  | "internal";

export const HTTP_STATUS: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  invalid: 422,
  conflict: 409,
  rate_limited: 429,
  unavailable: 503,
  too_large: 413,
  internal: 500,
};

export interface FieldIssue {
  path: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    public readonly code: ErrorCode,
    message: string,
    public readonly issues: FieldIssue[] = [],
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const notFound = (what = "Not found") => new AppError("not_found", what);
export const forbidden = (what = "You do not have permission to do this") => new AppError("forbidden", what);

export function fromZod(error: ZodError, message = "Some values are not valid"): AppError {
  return new AppError(
    "invalid",
    message,
    error.issues.map((i) => ({ path: i.path.join("."), message: i.message })),
  );
}

export function isAppError(e: unknown): e is AppError {
  return e instanceof AppError;
}
