"use server";
// Thin server actions for the rule settings page: authenticate, call one service.
import { runAction } from "@/lib/action-result";
import { saveRuleSettings } from "@/lib/services/diagnose/save-rule-settings";
import { previewRuleSettings } from "@/lib/services/diagnose/preview-rule-settings";
import { requestDiagnosis } from "@/lib/services/diagnose/request-diagnosis";

export async function saveRuleSettingsAction(scope: unknown, settings: unknown) {
  return runAction((actor) => saveRuleSettings(actor, scope, settings));
}

export async function previewRuleSettingsAction(scope: unknown, settings: unknown) {
  return runAction((actor) => previewRuleSettings(actor, { scope, settings, days: 30 }));
}

export async function requestDiagnosisAction(target: unknown) {
  return runAction((actor) => requestDiagnosis(actor, target));
}
