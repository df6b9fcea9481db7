// The trend chart's three stacked panels, the signals each shows, their plain names
// and colours (our own palette, tailwind.config.ts: copper for what goes down the
// casing, ink for what comes up the tubing, green for liquid).
import type { Quantity, Signal } from "@/lib/signals";

export interface PanelSignal {
  signal: Signal;
  name: string;
  color: string;
}

export interface PanelSpec {
  key: "pressure" | "gas" | "liquid";
  title: string;
  quantity: Quantity;
  signals: PanelSignal[];
}

export const CHART_PANELS: readonly PanelSpec[] = [
  {
    key: "pressure",
    title: "Pressures",
    quantity: "pressure",
    signals: [
      { signal: "casing_pressure", name: "Casing pressure", color: "#b4652b" },
      { signal: "tubing_pressure", name: "Tubing pressure", color: "#1d2a3a" },
    ],
  },
  {
    key: "gas",
    title: "Gas rates",
    quantity: "gas_rate",
    signals: [
      { signal: "injection_rate", name: "Injection gas", color: "#b4652b" },
      { signal: "gas_rate", name: "Produced gas", color: "#4a5a6e" },
    ],
  },
  {
    key: "liquid",
    title: "Liquid rate",
    quantity: "liquid_rate",
    signals: [{ signal: "liquid_rate", name: "Liquid", color: "#2f7d55" }],
  },
];
