// The signals Bellows stores, and the canonical unit each is stored in.
// Canonical units are oilfield units because every gas-lift formula we use
// (DOMAIN.md §3) is published in them; conversion happens at the edges.

export const SIGNALS = [
  "casing_pressure",
  "tubing_pressure",
  "injection_rate",
  "gas_rate",
  "liquid_rate",
  "oil_rate",
  "water_rate",
  "downhole_pressure",
  "casing_temperature",
  "tubing_temperature",
] as const;

export type Signal = (typeof SIGNALS)[number];

export type Quantity = "pressure" | "gas_rate" | "liquid_rate" | "temperature";

export const SIGNAL_QUANTITY: Record<Signal, Quantity> = {
  casing_pressure: "pressure",
  tubing_pressure: "pressure",
  downhole_pressure: "pressure",
  injection_rate: "gas_rate",
  gas_rate: "gas_rate",
  liquid_rate: "liquid_rate",
  oil_rate: "liquid_rate",
  water_rate: "liquid_rate",
  casing_temperature: "temperature",
  tubing_temperature: "temperature",
};

export const SIGNAL_LABEL: Record<Signal, string> = {
  casing_pressure: "Casing pressure",
  tubing_pressure: "Tubing pressure",
  downhole_pressure: "Downhole pressure",
  injection_rate: "Injection gas rate",
  gas_rate: "Produced gas rate",
  liquid_rate: "Liquid rate",
  oil_rate: "Oil rate",
  water_rate: "Water rate",
  casing_temperature: "Casing temperature",
  tubing_temperature: "Tubing temperature",
};

/** Small integer codes used in the samples table (2 bytes instead of text). */
export const SIGNAL_CODE: Record<Signal, number> = Object.fromEntries(
  SIGNALS.map((s, i) => [s, i + 1]),
) as Record<Signal, number>;
