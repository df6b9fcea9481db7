"use server";

import { requestPasswordReset } from "@/lib/services/auth/request-password-reset";
import { setPasswordWithToken } from "@/lib/services/auth/set-password-with-token";
import { isAppError, type FieldIssue } from "@/lib/errors";

export type FormState = { ok: boolean; message: string; issues: FieldIssue[] } | null;

function fail(e: unknown): FormState {
  if (isAppError(e)) return { ok: false, message: e.message, issues: e.issues };
  console.error("[auth action]", e);
  return { ok: false, message: "Something went wrong on our side", issues: [] };
}

export async function requestResetAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    await requestPasswordReset({ email: form.get("email") });
    return { ok: true, message: "If that address has an account, a reset link is on its way.", issues: [] };
  } catch (e) {
    return fail(e);
  }
}

export async function setPasswordAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    await setPasswordWithToken({ token: form.get("token"), password: form.get("password"), confirm: form.get("confirm") });
    return { ok: true, message: "Password set.", issues: [] };
  } catch (e) {
    return fail(e);
  }
}
