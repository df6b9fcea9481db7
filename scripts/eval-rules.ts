// Evaluate the diagnostic rules on a labelled synthetic field (lib/scenario) and
// print the per-rule confusion table and onset errors.
//   node --import tsx scripts/eval-rules.ts [seed] [wells] [days]
// Seeds 101–105 were used for tuning; the unit test uses a different seed.
import { generateField } from "@/lib/scenario/field";
import { diagnosePad } from "@/lib/diagnostics/diagnose-pad";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";
import { evaluateFindings, formatEvaluationTable } from "@/lib/diagnostics/evaluate";

const seed = Number(process.argv[2] ?? 101);
const wellCount = Number(process.argv[3] ?? 48);
const days = Number(process.argv[4] ?? 10);
const start = Date.UTC(2026, 0, 5);

const t0 = performance.now();
const field = generateField({ seed, wells: wellCount, days, start });
const t1 = performance.now();
const perWell = [];
let fieldEventCount = 0;
for (const pad of field.pads) {
  const wells = field.wells.filter((w) => w.padId === pad.padId);
  const result = diagnosePad(wells.map((w) => ({ wellId: w.wellId, design: w.design, series: w.series, settings: DEFAULT_SETTINGS })));
  fieldEventCount += result.fieldEvents.length;
  for (const r of result.wells) {
    const w = wells.find((x) => x.wellId === r.wellId)!;
    perWell.push({ wellId: w.wellId, findings: r.findings, labels: w.labels, dataEnd: w.series.t[w.series.t.length - 1], kind: w.kind });
  }
}
const t2 = performance.now();
const result = evaluateFindings(perWell);
console.log(`Field "${field.name}", seed ${seed}: ${field.wells.length} wells on ${field.pads.length} pads, ${days} days of minute data.`);
console.log(`Generated in ${(t1 - t0).toFixed(0)} ms; diagnosed in ${(t2 - t1).toFixed(0)} ms; ${fieldEventCount} field event(s) detected (outage pads: ${field.pads.filter((p) => p.outages.length).length}).\n`);
console.log(formatEvaluationTable(result));
console.log(`\nWell issues raised on confounder-only wells: ${result.confounderAlarms.length}`);
for (const a of result.confounderAlarms) console.log(`  ${a.wellId} ${a.rule} at ${new Date(a.start).toISOString()}`);
if (process.env.VERBOSE) {
  for (const w of perWell) {
    const fs = w.findings.map((f) => `${f.rule}@${((f.start - start) / 3.6e6).toFixed(1)}h..${f.end === null ? "open" : ((f.end - start) / 3.6e6).toFixed(1) + "h"}`);
    const ls = w.labels.map((l) => `${l.kind}@${((l.start - start) / 3.6e6).toFixed(1)}h..${l.end === null ? "open" : ((l.end - start) / 3.6e6).toFixed(1) + "h"}`);
    console.log(`${w.wellId} [${w.kind}] labels: ${ls.join(", ")} | findings: ${fs.join(", ")}`);
  }
}
