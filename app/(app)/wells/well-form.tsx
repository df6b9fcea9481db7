"use client";
// The well form for /wells/new and /wells/[id]/edit. It validates with the
// same WellSchema as the server action, so the messages match; the server's
// field issues (e.g. identifier already in use) land on the same fields.
// Values are entered in canonical oilfield units.
import { useState } from "react";
import Link from "next/link";
import { Controller, useForm, type FieldPath, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { WELL_STATUSES, WELL_STATUS_LABEL, WellSchema } from "@/lib/validations/well";
import type { FieldNode } from "@/lib/services/wells/list-field-tree";
import { saveWellAction } from "./actions";
import { FieldPadCreator } from "./field-pad-creator";

type WellFormInput = z.input<typeof WellSchema>;
type WellFormOutput = z.output<typeof WellSchema>;
type WellKey = FieldPath<WellFormInput>;

const NUMERIC_KEYS = [
  "tubingIdIn", "tubingDepthFt", "perfDepthFt", "surfaceTempF", "bottomholeTempF", "gasSg",
  "liquidGravity", "waterCut", "reservoirPressurePsig", "injectionPressurePsig",
] as const;

const baseResolver = zodResolver(WellSchema);
// z.coerce reads an empty box as 0, which would give a range message for a
// value nobody typed; treat blank as missing so the message says "a number".
const resolver: Resolver<WellFormInput, unknown, WellFormOutput> = (values, ctx, options) => {
  const cleaned: Record<string, unknown> = { ...values };
  for (const k of NUMERIC_KEYS) if (typeof cleaned[k] === "string" && (cleaned[k] as string).trim() === "") cleaned[k] = undefined;
  return baseResolver(cleaned as WellFormInput, ctx, options);
};

export type WellFormValues = Partial<WellFormInput>;

export function WellForm({ tree: initialTree, initial, wellId }: { tree: FieldNode[]; initial: WellFormValues; wellId?: number }) {
  const [tree, setTree] = useState(initialTree);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    getValues,
    getFieldState,
    formState: { errors, isSubmitting },
  } = useForm<WellFormInput, unknown, WellFormOutput>({
    resolver,
    defaultValues: { status: "producing", liquidType: "oil", timeZone: "UTC", padId: "", ...initial },
    mode: "onTouched",
  });

  // For a new well, choosing a pad proposes its field's time zone unless the
  // user typed one; an existing well keeps its own.
  function proposeTimeZone(padId: string) {
    if (wellId !== undefined) return;
    const f = tree.find((x) => x.pads.some((p) => String(p.id) === padId));
    if (f && !getFieldState("timeZone").isDirty) setValue("timeZone", f.timeZone);
  }

  async function onSubmit(data: WellFormOutput) {
    setFormError(null);
    const r = await saveWellAction(data, wellId);
    if (!r || r.ok) return; // success redirects to the well page
    setFormError(r.message);
    for (const issue of r.issues) {
      const key = issue.path as WellKey;
      if (key in getValues() || NUMERIC_KEYS.includes(key as (typeof NUMERIC_KEYS)[number])) setError(key, { message: issue.message });
    }
  }

  const text = (name: WellKey, label: string, extra: React.InputHTMLAttributes<HTMLInputElement> = {}) => (
    <div>
      <label htmlFor={`well-${name}`} className="field-label">{label}</label>
      <input
        id={`well-${name}`}
        className="field-input"
        aria-invalid={!!errors[name]}
        aria-describedby={errors[name] ? `well-${name}-error` : undefined}
        {...extra}
        {...register(name)}
      />
      {errors[name]?.message && <p id={`well-${name}-error`} className="field-error">{String(errors[name]?.message)}</p>}
    </div>
  );
  const num = (name: WellKey, label: string) => text(name, label, { type: "text", inputMode: "decimal", autoComplete: "off" });

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_18rem]">
      <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-6" data-testid="well-form">
        <fieldset className="grid gap-3 sm:grid-cols-2">
          <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">Well</legend>
          {text("name", "Well name")}
          {text("uwi", "Identifier", { autoComplete: "off", spellCheck: false })}
          <div>
            <label htmlFor="well-padId" className="field-label">Pad</label>
            <Controller
              control={control}
              name="padId"
              render={({ field }) => (
                <select
                  id="well-padId"
                  className="field-input"
                  aria-invalid={!!errors.padId}
                  name={field.name}
                  ref={field.ref}
                  onBlur={field.onBlur}
                  value={String(field.value ?? "")}
                  onChange={(e) => {
                    field.onChange(e.target.value);
                    proposeTimeZone(e.target.value);
                  }}
                >
                  <option value="">Choose a pad</option>
                  {tree.map((f) => (
                    <optgroup key={f.id} label={f.name}>
                      {f.pads.map((p) => <option key={p.id} value={String(p.id)}>{p.name}</option>)}
                    </optgroup>
                  ))}
                </select>
              )}
            />
            {errors.padId?.message && <p className="field-error">{errors.padId.message}</p>}
          </div>
          <div>
            <label htmlFor="well-status" className="field-label">Status</label>
            <select id="well-status" className="field-input" {...register("status")}>
              {WELL_STATUSES.map((s) => <option key={s} value={s}>{WELL_STATUS_LABEL[s]}</option>)}
            </select>
            {errors.status?.message && <p className="field-error">{errors.status.message}</p>}
          </div>
          {text("timeZone", "Time zone", { autoComplete: "off", spellCheck: false, placeholder: "IANA name, e.g. UTC" })}
        </fieldset>

        <fieldset className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">Completion (oilfield units)</legend>
          {num("tubingIdIn", "Tubing inner diameter (in)")}
          {num("tubingDepthFt", "Tubing depth (ft)")}
          {num("perfDepthFt", "Perforation depth (ft)")}
          {num("surfaceTempF", "Surface temperature (°F)")}
          {num("bottomholeTempF", "Bottom-hole temperature (°F)")}
          {num("gasSg", "Injection gas specific gravity")}
          <div>
            <label htmlFor="well-liquidType" className="field-label">Produced liquid</label>
            <select id="well-liquidType" className="field-input" {...register("liquidType")}>
              <option value="oil">Oil</option>
              <option value="water">Water</option>
              <option value="condensate">Condensate</option>
            </select>
          </div>
          {num("liquidGravity", "Liquid gravity (°API, or SG for water)")}
          {num("waterCut", "Water cut (fraction 0–1)")}
          {num("reservoirPressurePsig", "Reservoir static pressure (psig)")}
          {num("injectionPressurePsig", "Available injection pressure (psig)")}
        </fieldset>

        {formError && <p role="alert" className="rounded bg-bad/10 px-2 py-1 text-sm text-bad">{formError}</p>}
        <div className="flex items-center gap-3">
          <button type="submit" disabled={isSubmitting} className="rounded bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink/90 disabled:opacity-60">
            {isSubmitting ? "Saving…" : wellId ? "Save well" : "Create well"}
          </button>
          <Link href={wellId ? `/wells/${wellId}` : "/wells"} className="text-sm text-ink-soft hover:text-ink">Cancel</Link>
        </div>
      </form>

      <FieldPadCreator
        tree={tree}
        onFieldCreated={(f) => setTree((t) => [...t, f].sort((a, b) => a.name.localeCompare(b.name)))}
        onPadCreated={(p) => {
          setTree((t) => t.map((f) => (f.id === p.fieldId ? { ...f, pads: [...f.pads, { id: p.id, name: p.name }] } : f)));
          setValue("padId", String(p.id), { shouldValidate: true, shouldDirty: true });
          const f = tree.find((x) => x.id === p.fieldId);
          if (f && wellId === undefined && !getFieldState("timeZone").isDirty) setValue("timeZone", f.timeZone);
        }}
      />
    </div>
  );
}
