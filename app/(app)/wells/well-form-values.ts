import type { WellDetail } from "@/lib/services/wells/well-dto";
import type { WellFormValues } from "./well-form";

/** A stored well as the form's text boxes show it (canonical oilfield units). */
export function toWellFormValues(w: WellDetail): WellFormValues {
  const d = w.design;
  return {
    name: w.name,
    uwi: w.uwi,
    padId: String(w.padId),
    status: w.status,
    timeZone: w.timeZone,
    tubingIdIn: String(d.tubingIdIn),
    tubingDepthFt: String(d.tubingDepthFt),
    perfDepthFt: String(d.perfDepthFt),
    surfaceTempF: String(d.surfaceTempF),
    bottomholeTempF: String(d.bottomholeTempF),
    gasSg: String(d.gasSg),
    liquidType: d.liquidType,
    liquidGravity: String(d.liquidGravity),
    waterCut: String(d.waterCut),
    reservoirPressurePsig: String(d.reservoirPressurePsig),
    injectionPressurePsig: String(d.injectionPressurePsig),
  };
}
