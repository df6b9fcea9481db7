"use client";
// The valve string as an editable table, top mandrel first. Positions are the
// row order (1, 2, 3…), set here rather than typed, so the only ordering
// errors left are depths that do not increase. Validated with
// ValveStringSchema here and again on the server.
import { useState } from "react";
import Link from "next/link";
import { useFieldArray, useForm, type FieldPath, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { ValveStringSchema } from "@/lib/validations/well";
import { saveValveStringAction } from "../../actions";

const FormSchema = z.object({ mandrels: ValveStringSchema });
type FormInput = z.input<typeof FormSchema>;
type FormOutput = z.output<typeof FormSchema>;
export type MandrelRowValues = FormInput["mandrels"][number];

const REQUIRED_NUMBERS = ["mdFt", "tvdFt"] as const;

const baseResolver = zodResolver(FormSchema);
const resolver: Resolver<FormInput, unknown, FormOutput> = (values, ctx, options) =>
  baseResolver(
    {
      mandrels: values.mandrels.map((m, i) => {
        const row: Record<string, unknown> = { ...m, position: i + 1 };
        // A blank depth is "missing", not 0 (z.coerce would read it as 0).
        for (const k of REQUIRED_NUMBERS) if (typeof row[k] === "string" && (row[k] as string).trim() === "") row[k] = undefined;
        return row as MandrelRowValues;
      }),
    },
    ctx,
    options,
  );

const EMPTY_ROW: MandrelRowValues = { position: 0, mdFt: "", tvdFt: "", kind: "ipo", portIn: "", valveOdIn: "", rRatio: "", tropsig: "", installedOn: "" };

type CellKey = "mdFt" | "tvdFt" | "portIn" | "rRatio" | "tropsig" | "installedOn";

export function ValveStringForm({ wellId, initial }: { wellId: number; initial: MandrelRowValues[] }) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, FormOutput>({ resolver, defaultValues: { mandrels: initial }, mode: "onSubmit", reValidateMode: "onChange" });
  const { fields, append, remove, move } = useFieldArray({ control, name: "mandrels" });

  async function onSubmit(data: FormOutput) {
    setFormError(null);
    const r = await saveValveStringAction(wellId, data.mandrels);
    if (!r || r.ok) return; // success redirects to the well page
    setFormError(r.message);
    for (const issue of r.issues) {
      const [index, key] = issue.path.split(".");
      if (index !== undefined && key) setError(`mandrels.${Number(index)}.${key}` as FieldPath<FormInput>, { message: issue.message });
    }
  }

  const cellError = (i: number, key: keyof MandrelRowValues) => errors.mandrels?.[i]?.[key]?.message;
  const cell = (i: number, key: CellKey, label: string, type = "text") => {
    const message = cellError(i, key);
    return (
      <td>
        <input
          type={type}
          inputMode={type === "text" ? "decimal" : undefined}
          aria-label={`Row ${i + 1} ${label}`}
          aria-invalid={!!message}
          className="field-input min-w-20"
          data-testid={`valve-${i}-${key}`}
          {...register(`mandrels.${i}.${key}`)}
        />
        {message && <p className="field-error">{message}</p>}
      </td>
    );
  };
  const listMessage = errors.mandrels?.root?.message ?? errors.mandrels?.message;

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4" data-testid="valve-string-form">
      <div className="overflow-x-auto rounded border border-line bg-paper-raised">
        <table className="data-table w-full">
          <caption className="sr-only">Valve string, top to bottom</caption>
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">MD (ft)</th>
              <th scope="col">TVD (ft)</th>
              <th scope="col">Kind</th>
              <th scope="col">Port (in)</th>
              <th scope="col">Valve size (in)</th>
              <th scope="col">R</th>
              <th scope="col">Test-rack opening (psig)</th>
              <th scope="col">Installed</th>
              <th scope="col"><span className="sr-only">Row actions</span></th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => (
              <tr key={f.id} data-testid="valve-row">
                <td className="pt-3 tabular-nums">
                  {i + 1}
                  {cellError(i, "position") && <p className="field-error">{cellError(i, "position")}</p>}
                </td>
                {cell(i, "mdFt", "measured depth (ft)")}
                {cell(i, "tvdFt", "true vertical depth (ft)")}
                <td>
                  <select aria-label={`Row ${i + 1} kind`} title="ipo: unloading valve; orifice; dummy: no valve" className="field-input min-w-24" data-testid={`valve-${i}-kind`} {...register(`mandrels.${i}.kind`)}>
                    <option value="ipo">ipo</option>
                    <option value="orifice">orifice</option>
                    <option value="dummy">dummy</option>
                  </select>
                  {cellError(i, "kind") && <p className="field-error">{cellError(i, "kind")}</p>}
                </td>
                {cell(i, "portIn", "port size (in)")}
                <td>
                  <select aria-label={`Row ${i + 1} valve size (in)`} className="field-input" data-testid={`valve-${i}-valveOdIn`} {...register(`mandrels.${i}.valveOdIn`)}>
                    <option value="">—</option>
                    <option value="1">1</option>
                    <option value="1.5">1.5</option>
                  </select>
                  {cellError(i, "valveOdIn") && <p className="field-error">{cellError(i, "valveOdIn")}</p>}
                </td>
                {cell(i, "rRatio", "bellows area ratio R")}
                {cell(i, "tropsig", "test-rack opening pressure (psig)")}
                {cell(i, "installedOn", "install date", "date")}
                <td className="whitespace-nowrap">
                  <button type="button" onClick={() => move(i, i - 1)} disabled={i === 0} aria-label={`Move row ${i + 1} up`} className="px-1 text-ink-soft hover:text-ink disabled:opacity-30">↑</button>
                  <button type="button" onClick={() => move(i, i + 1)} disabled={i === fields.length - 1} aria-label={`Move row ${i + 1} down`} className="px-1 text-ink-soft hover:text-ink disabled:opacity-30">↓</button>
                  <button type="button" onClick={() => remove(i)} aria-label={`Remove row ${i + 1}`} className="ml-1 rounded px-1.5 text-xs text-bad hover:bg-bad/10">Remove</button>
                </td>
              </tr>
            ))}
            {fields.length === 0 && (
              <tr><td colSpan={10} className="text-center text-ink-soft">No mandrels. Saving an empty list clears the valve string.</td></tr>
            )}
          </tbody>
        </table>
      </div>
      {listMessage && <p className="field-error text-sm">{listMessage}</p>}
      {formError && <p role="alert" className="rounded bg-bad/10 px-2 py-1 text-sm text-bad">{formError}</p>}
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" onClick={() => append({ ...EMPTY_ROW })} className="rounded border border-line bg-paper-raised px-3 py-1.5 text-sm hover:border-ink-faint">
          Add row
        </button>
        <button type="submit" disabled={isSubmitting} className="rounded bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink/90 disabled:opacity-60">
          {isSubmitting ? "Saving…" : "Save valve string"}
        </button>
        <Link href={`/wells/${wellId}`} className="text-sm text-ink-soft hover:text-ink">Cancel</Link>
      </div>
    </form>
  );
}
