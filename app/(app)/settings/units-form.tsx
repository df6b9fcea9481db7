"use client";

import { useState, useTransition } from "react";
import { setUnitsAction } from "./actions";

export function UnitsForm({ current }: { current: "oilfield" | "metric" }) {
  const [value, setValue] = useState(current);
  const [msg, setMsg] = useState<string | null>(null);
  const [pending, start] = useTransition();
  return (
    <fieldset className="flex items-center gap-4 text-sm" disabled={pending}>
      <legend className="sr-only">Unit system</legend>
      {(["oilfield", "metric"] as const).map((u) => (
        <label key={u} className="flex items-center gap-1.5">
          <input
            type="radio"
            name="units"
            value={u}
            checked={value === u}
            onChange={() => {
              setValue(u);
              start(async () => {
                const r = await setUnitsAction(u);
                setMsg(r.ok ? "Saved" : r.message);
              });
            }}
          />
          {u === "oilfield" ? "Oilfield" : "Metric"}
        </label>
      ))}
      {msg && <span role="status" className="text-xs text-ink-soft">{msg}</span>}
    </fieldset>
  );
}
