// IANA zones offered in the mapping step. Computed on the server and passed
// down, so the server render and the browser show the same list.
export function listTimeZones(extra: string[] = []): string[] {
  let zones: string[] = [];
  try {
    zones = Intl.supportedValuesOf("timeZone");
  } catch {
    zones = [];
  }
  return [...new Set(["UTC", ...extra, ...zones])].sort((a, b) => (a === "UTC" ? -1 : b === "UTC" ? 1 : a.localeCompare(b)));
}
