"use client";
// Small inline forms to add a field or a pad while filling in a well, so an
// engineer need not leave the form. They sit outside the well <form> (forms
// may not nest) and validate with the same schemas as the server.
import { useState } from "react";
import { FieldSchema, PadSchema } from "@/lib/validations/well";
import type { FieldNode } from "@/lib/services/wells/list-field-tree";
import { createFieldAction, createPadAction } from "./actions";

type Messages = Record<string, string>;

function toMessages(issues: { path: string; message: string }[]): Messages {
  const out: Messages = {};
  for (const i of issues) out[i.path || "form"] ??= i.message;
  return out;
}

export function FieldPadCreator({
  tree,
  onFieldCreated,
  onPadCreated,
}: {
  tree: FieldNode[];
  onFieldCreated: (field: FieldNode) => void;
  onPadCreated: (pad: { id: number; name: string; fieldId: number }) => void;
}) {
  const [field, setField] = useState({ name: "", timeZone: "UTC" });
  const [fieldMsg, setFieldMsg] = useState<Messages>({});
  const [pad, setPad] = useState({ name: "", fieldId: "" });
  const [padMsg, setPadMsg] = useState<Messages>({});
  const [busy, setBusy] = useState<"field" | "pad" | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  async function addField(e: React.FormEvent) {
    e.preventDefault();
    setNotice(null);
    const check = FieldSchema.safeParse(field);
    if (!check.success) return setFieldMsg(toMessages(check.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }))));
    setBusy("field");
    const r = await createFieldAction(check.data);
    setBusy(null);
    if (!r.ok) return setFieldMsg({ form: r.message, ...toMessages(r.issues) });
    setFieldMsg({});
    onFieldCreated({ id: r.data, name: check.data.name, timeZone: check.data.timeZone, pads: [] });
    setPad((p) => ({ ...p, fieldId: String(r.data) }));
    setField({ name: "", timeZone: check.data.timeZone });
    setNotice(`Field “${check.data.name}” added. Now add a pad to it.`);
  }

  async function addPad(e: React.FormEvent) {
    e.preventDefault();
    setNotice(null);
    const check = PadSchema.safeParse(pad);
    if (!check.success) return setPadMsg(toMessages(check.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }))));
    setBusy("pad");
    const r = await createPadAction(check.data);
    setBusy(null);
    if (!r.ok) return setPadMsg({ form: r.message, ...toMessages(r.issues) });
    setPadMsg({});
    onPadCreated({ id: r.data, name: check.data.name, fieldId: check.data.fieldId });
    setPad({ name: "", fieldId: pad.fieldId });
    setNotice(`Pad “${check.data.name}” added and chosen for this well.`);
  }

  return (
    <div className="space-y-4 rounded border border-line bg-paper-sunk/60 p-3" data-testid="field-pad-creator">
      <p className="text-xs text-ink-soft">Pad not in the list? Add it here.</p>
      <form onSubmit={addField} noValidate className="space-y-2" aria-label="New field">
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">New field</h3>
        <div>
          <label htmlFor="new-field-name" className="field-label">Field name</label>
          <input id="new-field-name" className="field-input" value={field.name} onChange={(e) => setField({ ...field, name: e.target.value })} aria-invalid={!!fieldMsg.name} />
          {fieldMsg.name && <p className="field-error">{fieldMsg.name}</p>}
        </div>
        <div>
          <label htmlFor="new-field-tz" className="field-label">Field time zone</label>
          <input id="new-field-tz" className="field-input" value={field.timeZone} onChange={(e) => setField({ ...field, timeZone: e.target.value })} aria-invalid={!!fieldMsg.timeZone} />
          {fieldMsg.timeZone && <p className="field-error">{fieldMsg.timeZone}</p>}
        </div>
        {fieldMsg.form && <p className="field-error" role="alert">{fieldMsg.form}</p>}
        <button type="submit" disabled={busy !== null} className="rounded border border-line bg-paper-raised px-2 py-1 text-xs hover:border-ink-faint disabled:opacity-60">
          {busy === "field" ? "Adding…" : "Add field"}
        </button>
      </form>

      <form onSubmit={addPad} noValidate className="space-y-2" aria-label="New pad">
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">New pad</h3>
        <div>
          <label htmlFor="new-pad-field" className="field-label">Field of the pad</label>
          <select id="new-pad-field" className="field-input" value={pad.fieldId} onChange={(e) => setPad({ ...pad, fieldId: e.target.value })} aria-invalid={!!padMsg.fieldId}>
            <option value="">Choose a field</option>
            {tree.map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
          </select>
          {padMsg.fieldId && <p className="field-error">{padMsg.fieldId}</p>}
        </div>
        <div>
          <label htmlFor="new-pad-name" className="field-label">Pad name</label>
          <input id="new-pad-name" className="field-input" value={pad.name} onChange={(e) => setPad({ ...pad, name: e.target.value })} aria-invalid={!!padMsg.name} />
          {padMsg.name && <p className="field-error">{padMsg.name}</p>}
        </div>
        {padMsg.form && <p className="field-error" role="alert">{padMsg.form}</p>}
        <button type="submit" disabled={busy !== null} className="rounded border border-line bg-paper-raised px-2 py-1 text-xs hover:border-ink-faint disabled:opacity-60">
          {busy === "pad" ? "Adding…" : "Add pad"}
        </button>
      </form>
      {notice && <p className="text-xs text-good" role="status">{notice}</p>}
    </div>
  );
}
