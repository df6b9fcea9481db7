"use client";
// The accessible fallback of the trend chart: the same (reduced) values as tables,
// one per panel, built only once the reader opens them.
import { useState } from "react";
import { formatFieldTime } from "@/lib/trends/chart-time";

export interface NumbersPanel {
  title: string;
  unit: string;
  t: number[];
  columns: { name: string; values: (number | null | undefined)[] }[];
}

const NUMBER = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });

export function ChartNumbersTable({ panels, timeZone, note }: { panels: NumbersPanel[]; timeZone: string; note: string }) {
  const [isOpen, setIsOpen] = useState(false);
  return (
    <details className="text-sm" onToggle={(e) => setIsOpen((e.target as HTMLDetailsElement).open)} data-testid="chart-numbers">
      <summary className="cursor-pointer text-ink-soft hover:text-ink">Show the numbers</summary>
      {isOpen && (
        <div className="mt-2 space-y-4">
          <p className="text-xs text-ink-soft">{note} Times in {timeZone}.</p>
          {panels.map((p) => (
            <div key={p.title} className="max-h-80 overflow-auto rounded border border-line">
              <table className="data-table w-full">
                <caption className="sr-only">{p.title} ({p.unit})</caption>
                <thead>
                  <tr>
                    <th scope="col">Time</th>
                    {p.columns.map((c) => (
                      <th key={c.name} scope="col">{c.name} ({p.unit})</th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {p.t.map((t, i) => (
                    <tr key={t}>
                      <td className="whitespace-nowrap">{formatFieldTime(t, timeZone)}</td>
                      {p.columns.map((c) => {
                        const v = c.values[i];
                        return <td key={c.name} className="text-right tabular-nums">{typeof v === "number" ? NUMBER.format(v) : ""}</td>;
                      })}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ))}
        </div>
      )}
    </details>
  );
}
