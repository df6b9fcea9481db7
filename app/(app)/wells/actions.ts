"use server";
// Thin server actions for the well register: each validates through the
// service (same zod schemas as the forms), maps errors with runAction, and
// only then redirects, since redirect() works by throwing and runAction
// would otherwise report it as a failure.
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { runAction, type ActionResult } from "@/lib/action-result";
import { saveWell } from "@/lib/services/wells/save-well";
import { saveValveString } from "@/lib/services/wells/save-valve-string";
import { createField, createPad } from "@/lib/services/wells/save-field-or-pad";
import { importRegisterCsv, type ImportResult } from "@/lib/services/wells/import-register-csv";
import { notFound } from "@/lib/errors";

// Action arguments arrive from the browser: a bad id must be a 404, not a query error.
function toWellId(raw: unknown): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) throw notFound("Well not found");
  return id;
}

/** Create (no wellId) or update a well; on success go to its page. */
export async function saveWellAction(input: unknown, wellId?: number): Promise<ActionResult<number>> {
  const result = await runAction((actor) => saveWell(actor, input, wellId === undefined ? undefined : toWellId(wellId)));
  if (!result.ok) return result;
  revalidatePath("/wells");
  redirect(`/wells/${result.data}`);
}

/** Replace a well's valve string; on success go back to the well page. */
export async function saveValveStringAction(wellId: number, mandrels: unknown): Promise<ActionResult<undefined>> {
  const result = await runAction(async (actor) => {
    await saveValveString(actor, toWellId(wellId), mandrels);
    return undefined;
  });
  if (!result.ok) return result;
  revalidatePath(`/wells/${wellId}`);
  redirect(`/wells/${wellId}`);
}

export async function createFieldAction(input: unknown): Promise<ActionResult<number>> {
  return runAction((actor) => createField(actor, input));
}

export async function createPadAction(input: unknown): Promise<ActionResult<number>> {
  return runAction((actor) => createPad(actor, input));
}

/** Preview (apply false) or write (apply true) a register CSV read in the browser. */
export async function importRegisterAction(input: { text: string; fileName: string; apply: boolean }): Promise<ActionResult<ImportResult>> {
  const result = await runAction((actor) =>
    importRegisterCsv(actor, { text: String(input?.text ?? ""), fileName: String(input?.fileName ?? "file"), apply: input?.apply === true }),
  );
  if (result.ok && result.data.applied) revalidatePath("/wells");
  return result;
}
