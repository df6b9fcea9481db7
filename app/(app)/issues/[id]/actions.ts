"use server";
// Single-issue triage from the issue page: each action authenticates, passes
// the input to one service and maps errors for the form (runAction).
import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/action-result";
import { acknowledgeIssue } from "@/lib/services/issues/acknowledge-issue";
import { assignIssue } from "@/lib/services/issues/assign-issue";
import { resolveIssue } from "@/lib/services/issues/resolve-issue";
import { dismissIssue } from "@/lib/services/issues/dismiss-issue";
import { shelveIssue } from "@/lib/services/issues/shelve-issue";
import { reopenIssue } from "@/lib/services/issues/reopen-issue";
import { addComment } from "@/lib/services/issues/add-comment";
import { addPhoto } from "@/lib/services/issues/add-photo";
import { AppError } from "@/lib/errors";

function refresh(issueId: number) {
  revalidatePath(`/issues/${issueId}`);
  revalidatePath("/issues");
  revalidatePath("/my-work");
}

function field(form: FormData, name: string): string | undefined {
  const v = form.get(name);
  return typeof v === "string" ? v : undefined;
}

export async function acknowledgeAction(issueId: number) {
  const r = await runAction((actor) => acknowledgeIssue(actor, issueId));
  if (r.ok) refresh(issueId);
  return r;
}

export async function assignAction(issueId: number, form: FormData) {
  const r = await runAction((actor) => assignIssue(actor, issueId, { assigneeId: field(form, "assigneeId"), priority: field(form, "priority") || undefined, dueOn: field(form, "dueOn") }));
  if (r.ok) refresh(issueId);
  return r;
}

export async function resolveAction(issueId: number, form: FormData) {
  const r = await runAction((actor) => resolveIssue(actor, issueId, { action: field(form, "action") ?? "", note: field(form, "note") ?? "" }));
  if (r.ok) refresh(issueId);
  return r;
}

export async function dismissAction(issueId: number, form: FormData) {
  const r = await runAction((actor) => dismissIssue(actor, issueId, { reason: field(form, "reason"), note: field(form, "note") }));
  if (r.ok) refresh(issueId);
  return r;
}

export async function shelveAction(issueId: number, form: FormData) {
  const r = await runAction((actor) => shelveIssue(actor, issueId, { until: field(form, "until") ?? "" }));
  if (r.ok) refresh(issueId);
  return r;
}

export async function reopenAction(issueId: number) {
  const r = await runAction((actor) => reopenIssue(actor, issueId));
  if (r.ok) refresh(issueId);
  return r;
}

export async function commentAction(issueId: number, form: FormData) {
  const r = await runAction((actor) => addComment(actor, issueId, { body: field(form, "body") ?? "" }));
  if (r.ok) refresh(issueId);
  return r;
}

export async function photoAction(issueId: number, form: FormData) {
  const r = await runAction(async (actor) => {
    const file = form.get("photo");
    if (!(file instanceof File) || file.size === 0) throw new AppError("invalid", "Choose a photo", [{ path: "photo", message: "required" }]);
    return addPhoto(actor, issueId, { fileName: file.name, contentType: file.type, bytes: new Uint8Array(await file.arrayBuffer()) });
  });
  if (r.ok) refresh(issueId);
  return r;
}
