import type { ImportResult, ImportChange } from "@/lib/services/wells/import-register-csv";

const ACTION_LABEL: Record<ImportChange["action"], string> = {
  create: "Create",
  update: "Update",
  unchanged: "Unchanged",
  skipped: "Skipped",
};

const ACTION_TONE: Record<ImportChange["action"], string> = {
  create: "text-good",
  update: "text-copper-dark",
  unchanged: "text-ink-soft",
  skipped: "text-bad",
};

/** The row errors and the per-well changes of an import, before or after it is written. */
export function RegisterImportTables({ result }: { result: ImportResult }) {
  const badRows = new Set(result.errors.map((e) => e.row)).size;
  return (
    <div className="space-y-3">
      <p className="text-sm" data-testid="import-summary">
        {result.kind === "wells" ? "Well list" : "Valve design"}: {result.rowCount} {result.rowCount === 1 ? "row" : "rows"}, {badRows}{" "}
        {badRows === 1 ? "row" : "rows"} with errors.
      </p>

      {result.errors.length > 0 && (
        <div className="overflow-x-auto rounded border border-bad/40 bg-paper-raised">
          <table className="data-table w-full" data-testid="import-errors">
            <caption className="px-2 py-1.5 text-left text-sm font-semibold text-bad">Rows with errors</caption>
            <thead>
              <tr>
                <th scope="col" className="text-right">Row</th>
                <th scope="col">Column</th>
                <th scope="col">Message</th>
              </tr>
            </thead>
            <tbody>
              {result.errors.map((e, i) => (
                <tr key={`${e.row}-${e.column}-${i}`} data-testid="import-error-row">
                  <td className="text-right tabular-nums">{e.row}</td>
                  <td className="font-mono text-xs">{e.column || "—"}</td>
                  <td>{e.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}

      {result.changes.length > 0 && (
        <div className="overflow-x-auto rounded border border-line bg-paper-raised">
          <table className="data-table w-full" data-testid="import-changes">
            <caption className="px-2 py-1.5 text-left text-sm font-semibold">{result.applied ? "What was done" : "What the import would do"}</caption>
            <thead>
              <tr>
                <th scope="col">Identifier</th>
                <th scope="col">Action</th>
                <th scope="col">Detail</th>
              </tr>
            </thead>
            <tbody>
              {result.changes.map((c, i) => (
                <tr key={`${c.key}-${i}`} data-testid="import-change-row">
                  <td className="font-mono text-xs">{c.key}</td>
                  <td className={`font-medium ${ACTION_TONE[c.action]}`}>{ACTION_LABEL[c.action]}</td>
                  <td>{c.detail}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
