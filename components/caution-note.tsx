// The standing caution wherever pressures and field work appear
// (DOMAIN.md §5): advisory only, local rules and licensed judgment decide.
export function CautionNote({ compact = false }: { compact?: boolean }) {
  return (
    <p
      role="note"
      className={`rounded border border-warn/40 bg-warn/10 text-ink ${compact ? "px-2 py-1 text-xs" : "px-3 py-2 text-sm"}`}
    >
      <strong className="font-semibold">Advisory only.</strong> Gas lift runs at high pressure with flammable gas.
      Every finding here is a prompt to look, not an instruction: field work follows your company&apos;s procedures,
      local regulations and licensed engineering judgment. Nobody changes a well on this tool&apos;s word alone.
    </p>
  );
}
