"use client";
// The triage controls this person may use on this issue (the server checks
// again). Resolve sits first so an operator on a phone sees it at once.
import { useRef, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import type { ActionResult } from "@/lib/action-result";
import { DISMISS_REASONS, DISMISS_REASON_LABEL, PRIORITIES } from "@/lib/validations/issues";
import type { TriageAction } from "@/lib/services/issues/issue-transitions";
import { acknowledgeAction, assignAction, dismissAction, reopenAction, resolveAction, shelveAction } from "./actions";

type Result = ActionResult<unknown>;

function useRun() {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [isPending, start] = useTransition();
  const run = (fn: () => Promise<Result>, done: string, after?: () => void) =>
    start(async () => {
      const r = await fn();
      if (r.ok) {
        setMessage({ ok: true, text: done });
        after?.();
        router.refresh();
      } else {
        setMessage({ ok: false, text: r.message + (r.issues.length ? ` (${r.issues.map((i) => `${i.path}: ${i.message}`).join("; ")})` : "") });
      }
    });
  return { run, message, isPending };
}

const btn = "min-h-11 rounded px-4 py-2 text-sm font-medium disabled:opacity-50";

export function TriageControls(props: {
  issueId: number;
  allowed: TriageAction[];
  operators: { id: number; name: string }[];
  resolutionActions: string[];
  currentAssigneeId: number | null;
  /** Given by the server render so the client render is pure (YYYY-MM-DD, UTC). */
  dates: { today: string; tomorrow: string };
}) {
  const { issueId, allowed } = props;
  const { run, message, isPending } = useRun();
  const dialog = useRef<HTMLDialogElement>(null);
  const has = (a: TriageAction) => allowed.includes(a);
  const { today, tomorrow } = props.dates;

  if (allowed.length === 0) return <p className="text-sm text-ink-soft">No triage action is open to you on this issue.</p>;

  return (
    <div className="space-y-4">
      {message && <p role={message.ok ? "status" : "alert"} className={`text-sm ${message.ok ? "text-good" : "text-bad"}`}>{message.text}</p>}

      {has("resolve") && (
        <form aria-label="Resolve issue" className="space-y-2 rounded border border-line bg-paper-raised p-3"
          onSubmit={(e) => { e.preventDefault(); const f = new FormData(e.currentTarget); run(() => resolveAction(issueId, f), "Resolved"); }}>
          <h3 className="text-sm font-semibold">Resolve</h3>
          <div>
            <label htmlFor="resolve-action" className="field-label">What was done</label>
            <select id="resolve-action" name="action" required className="field-input min-h-11" defaultValue="">
              <option value="" disabled>Choose an action…</option>
              {props.resolutionActions.map((a) => <option key={a} value={a}>{a}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="resolve-note" className="field-label">Note</label>
            <textarea id="resolve-note" name="note" rows={3} maxLength={2000} className="field-input" />
          </div>
          <button type="submit" disabled={isPending} className={`${btn} w-full bg-good text-paper sm:w-auto`}>Resolve issue</button>
        </form>
      )}

      <div className="flex flex-wrap gap-2">
        {has("acknowledge") && (
          <button type="button" disabled={isPending} className={`${btn} border border-line bg-paper-raised`} onClick={() => run(() => acknowledgeAction(issueId), "Acknowledged")}>Acknowledge</button>
        )}
        {has("assign") && (
          <button type="button" disabled={isPending} className={`${btn} bg-ink text-paper`} onClick={() => dialog.current?.showModal()}>
            {props.currentAssigneeId ? "Reassign…" : "Assign…"}
          </button>
        )}
        {has("reopen") && (
          <button type="button" disabled={isPending} className={`${btn} border border-line bg-paper-raised`} onClick={() => run(() => reopenAction(issueId), "Reopened")}>Reopen</button>
        )}
      </div>

      {has("assign") && (
        <dialog ref={dialog} aria-labelledby="assign-title" className="w-full max-w-md rounded border border-line bg-paper-raised p-4 backdrop:bg-ink/30">
          <form className="space-y-3" onSubmit={(e) => {
            e.preventDefault();
            const f = new FormData(e.currentTarget);
            run(() => assignAction(issueId, f), "Assigned", () => dialog.current?.close());
          }}>
            <h3 id="assign-title" className="text-base font-semibold">Assign to a field operator</h3>
            <div>
              <label htmlFor="assign-operator" className="field-label">Operator</label>
              <select id="assign-operator" name="assigneeId" required className="field-input" defaultValue={props.currentAssigneeId ?? ""}>
                <option value="" disabled>Choose…</option>
                {props.operators.map((o) => <option key={o.id} value={o.id}>{o.name}</option>)}
              </select>
            </div>
            <div>
              <label htmlFor="assign-priority" className="field-label">Priority</label>
              <select id="assign-priority" name="priority" className="field-input" defaultValue="normal">
                {PRIORITIES.map((p) => <option key={p} value={p}>{p}</option>)}
              </select>
            </div>
            <div>
              <label htmlFor="assign-due" className="field-label">Due on</label>
              <input id="assign-due" name="dueOn" type="date" min={today} className="field-input" />
            </div>
            <div className="flex gap-2">
              <button type="submit" disabled={isPending} className={`${btn} bg-ink text-paper`}>Assign</button>
              <button type="button" className={`${btn} border border-line`} onClick={() => dialog.current?.close()}>Cancel</button>
            </div>
          </form>
        </dialog>
      )}

      {has("dismiss") && (
        <details className="rounded border border-line bg-paper-raised p-3">
          <summary className="cursor-pointer text-sm font-medium">Dismiss…</summary>
          <form aria-label="Dismiss issue" className="mt-2 space-y-2" onSubmit={(e) => { e.preventDefault(); const f = new FormData(e.currentTarget); run(() => dismissAction(issueId, f), "Dismissed"); }}>
            <div>
              <label htmlFor="dismiss-reason" className="field-label">Reason</label>
              <select id="dismiss-reason" name="reason" required className="field-input" defaultValue="">
                <option value="" disabled>Choose…</option>
                {DISMISS_REASONS.map((r) => <option key={r} value={r}>{DISMISS_REASON_LABEL[r]}</option>)}
              </select>
            </div>
            <div>
              <label htmlFor="dismiss-note" className="field-label">Note (optional)</label>
              <input id="dismiss-note" name="note" className="field-input" maxLength={2000} />
            </div>
            <button type="submit" disabled={isPending} className={`${btn} border border-line`}>Dismiss issue</button>
          </form>
        </details>
      )}

      {has("shelve") && (
        <details className="rounded border border-line bg-paper-raised p-3">
          <summary className="cursor-pointer text-sm font-medium">Shelve…</summary>
          <form aria-label="Shelve issue" className="mt-2 space-y-2" onSubmit={(e) => { e.preventDefault(); const f = new FormData(e.currentTarget); run(() => shelveAction(issueId, f), "Shelved"); }}>
            <div>
              <label htmlFor="shelve-until" className="field-label">Hide from the list until</label>
              <input id="shelve-until" name="until" type="date" required min={tomorrow} className="field-input" />
            </div>
            <button type="submit" disabled={isPending} className={`${btn} border border-line`}>Shelve issue</button>
          </form>
        </details>
      )}
    </div>
  );
}
