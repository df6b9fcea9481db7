"use client";
// A well's annotated trend: three stacked, cursor-synchronised panels (pressures with
// the valve reference lines, gas rates, liquid), issue windows and pad-wide field
// events drawn over every panel, signal checkboxes, drag-to-zoom that fetches finer
// data for the new range, pan and reset, the field's time zone on the time axis, the
// reader's units, and a table of the numbers as the accessible fallback.
import { useCallback, useEffect, useId, useMemo, useRef, useState } from "react";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import type { Signal } from "@/lib/signals";
import { DISPLAY_UNITS, displayValue, type UnitSystem } from "@/lib/units/units";
import type { TrendData } from "@/lib/trends/trend-types";
import { decodeTrendData, type WireTrendData } from "@/lib/trends/trend-wire";
import { CHART_PANELS } from "@/lib/trends/chart-panels";
import { alignSeries, convertValues } from "@/lib/trends/align-series";
import { formatBucket, formatFieldTime, scaleRange, shiftRange } from "@/lib/trends/chart-time";
import { formatPressure, formatValveLabel } from "@/lib/trends/valve-label";
import { QueryProvider } from "./query-provider";
import { CautionNote } from "./caution-note";
import { ChartPanel, type PanelSeries } from "./chart-panel";
import { ChartNumbersTable, type NumbersPanel } from "./chart-numbers-table";
import { VALVE_LINE_CLOSE, VALVE_LINE_OPEN, type ChartBand, type ChartRefLine } from "./chart-overlays";

export interface TrendChartProps {
  wellId: number;
  /** Epoch ms. */
  from: number;
  to: number;
  /** The field's IANA time zone, e.g. "America/Chicago". */
  timeZone: string;
  unitSystem: UnitSystem;
  highlightIssueId?: number;
  /** Height of each panel's plot, CSS px. */
  height?: number;
}

export function TrendChart(props: TrendChartProps) {
  return (
    <QueryProvider>
      <TrendChartView {...props} />
    </QueryProvider>
  );
}

async function fetchTrend(wellId: number, from: number, to: number, width: number): Promise<TrendData> {
  const qs = new URLSearchParams({ from: String(from), to: String(to), width: String(width) });
  const res = await fetch(`/api/wells/${wellId}/trends?${qs}`, { cache: "no-store" });
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
    throw new Error(body?.error?.message ?? `The trend could not be loaded (${res.status})`);
  }
  return decodeTrendData((await res.json()) as WireTrendData);
}

function TrendChartView({ wellId, from, to, timeZone, unitSystem, highlightIssueId, height = 180 }: TrendChartProps) {
  // The range shown; the props give the starting range that Reset returns to.
  const [base, setBase] = useState({ from, to });
  const [range, setRange] = useState({ from, to });
  if (base.from !== from || base.to !== to) {
    setBase({ from, to });
    setRange({ from, to });
  }
  const [hidden, setHidden] = useState<ReadonlySet<Signal>>(new Set());
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver((entries) => setWidth(Math.floor(entries[0].contentRect.width)));
    ro.observe(el);
    setWidth(Math.floor(el.getBoundingClientRect().width));
    return () => ro.disconnect();
  }, []);
  // Ask for a width rounded to 100 px so resizing does not refetch at every pixel.
  const queryWidth = width > 0 ? Math.max(200, Math.round(width / 100) * 100) : 0;

  const query = useQuery({
    queryKey: ["well-trend", wellId, range.from, range.to, queryWidth],
    queryFn: () => fetchTrend(wellId, range.from, range.to, queryWidth),
    enabled: queryWidth > 0,
    placeholderData: keepPreviousData,
    staleTime: 60_000,
  });
  const data = query.data;
  const syncKey = `trend-${useId()}`;
  const pressureUnit = DISPLAY_UNITS[unitSystem].pressure;

  const panels = useMemo(() => {
    if (!data) return [];
    return CHART_PANELS.map((spec) => {
      const parts = spec.signals.map((s) => data.series.find((x) => x.signal === s.signal) ?? { t: [], v: [] });
      const aligned = alignSeries(parts);
      const series: PanelSeries[] = spec.signals.map((s, i) => ({
        label: s.name,
        color: s.color,
        isShown: !hidden.has(s.signal),
        values: convertValues(aligned.values[i], (v) => displayValue(spec.quantity, v, unitSystem)),
      }));
      const hasValues = parts.some((p) => p.t.length > 0);
      return { spec, t: aligned.t, series, unit: DISPLAY_UNITS[unitSystem][spec.quantity], hasValues };
    });
  }, [data, hidden, unitSystem]);

  const bands = useMemo<ChartBand[]>(() => {
    if (!data) return [];
    return [
      ...data.overlays.fieldEvents.map((e) => ({ key: `event-${e.id}`, start: e.start, end: e.end, label: e.label, kind: "field-event" as const })),
      ...data.overlays.issues.map((i) => ({
        key: `issue-${i.id}`, start: i.start, end: i.end, label: i.label, kind: "issue" as const, isHighlighted: i.id === highlightIssueId,
      })),
    ];
  }, [data, highlightIssueId]);

  const refLines = useMemo<ChartRefLine[]>(() => {
    if (!data) return [];
    return data.overlays.valves.flatMap((v) => [
      ...(v.surfaceOpeningPsig === null ? [] : [{
        key: `v${v.position}-open`, style: "open" as const,
        value: displayValue("pressure", v.surfaceOpeningPsig, unitSystem),
        label: formatValveLabel(v.position, "open", v.surfaceOpeningPsig, unitSystem),
      }]),
      ...(v.surfaceClosingPsig === null ? [] : [{
        key: `v${v.position}-close`, style: "close" as const,
        value: displayValue("pressure", v.surfaceClosingPsig, unitSystem),
        label: formatValveLabel(v.position, "close", v.surfaceClosingPsig, unitSystem),
      }]),
    ]);
  }, [data, unitSystem]);

  const numbers = useMemo<NumbersPanel[]>(
    () => panels.map((p) => ({ title: p.spec.title, unit: p.unit, t: p.t, columns: p.series.map((s) => ({ name: s.label, values: s.values })) })),
    [panels],
  );

  const onZoom = useCallback((a: number, b: number) => setRange({ from: a, to: b }), []);
  const toggle = (signal: Signal) =>
    setHidden((prev) => {
      const next = new Set(prev);
      if (next.has(signal)) next.delete(signal);
      else next.add(signal);
      return next;
    });

  const isZoomed = range.from !== base.from || range.to !== base.to;
  const resolutionText = !data
    ? ""
    : data.resolution === "raw"
      ? "Every stored value is shown."
      : `Each point pair is the lowest and highest value of a ${formatBucket(data.bucketMs)} interval, so short spikes stay visible. Drag across a panel to zoom in.`;
  const op = data?.overlays.operatingPoint;
  const recentTubing = data?.overlays.recent.tubingPsig;

  return (
    <div className="space-y-3" data-testid="trend-chart" data-well-id={wellId}>
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <p className="mr-auto text-ink-soft" aria-live="polite">
          {formatFieldTime(range.from, timeZone)} – {formatFieldTime(range.to, timeZone)} <span className="text-ink-faint">({timeZone})</span>
          {query.isFetching && <span className="ml-2 text-ink-faint">Loading…</span>}
        </p>
        <ChartButton onClick={() => setRange(shiftRange(range.from, range.to, -0.5))}>← Earlier</ChartButton>
        <ChartButton onClick={() => setRange(shiftRange(range.from, range.to, 0.5))}>Later →</ChartButton>
        <ChartButton onClick={() => setRange(scaleRange(range.from, range.to, 2))}>Zoom out</ChartButton>
        <ChartButton onClick={() => setRange(base)} disabled={!isZoomed}>Reset</ChartButton>
      </div>

      <fieldset className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <legend className="sr-only">Signals to show</legend>
        {CHART_PANELS.flatMap((p) => p.signals).map((s) => (
          <label key={s.signal} className="inline-flex items-center gap-1.5">
            <input type="checkbox" checked={!hidden.has(s.signal)} onChange={() => toggle(s.signal)} />
            <span aria-hidden className="inline-block h-0.5 w-4" style={{ backgroundColor: s.color }} />
            {s.name}
          </label>
        ))}
      </fieldset>

      <div ref={box} className="space-y-4">
        {query.isError && (
          <p role="alert" className="rounded border border-bad/40 bg-bad/10 px-3 py-2 text-sm">{(query.error as Error).message}</p>
        )}
        {data && panels.every((p) => !p.hasValues) && (
          <p className="rounded border border-line bg-paper-sunk px-3 py-2 text-sm text-ink-soft" data-testid="trend-empty">
            No values are stored for this well in this range.
          </p>
        )}
        {width > 0 &&
          data &&
          panels.map((p, i) => (
            <div key={p.spec.key} className="space-y-1">
              <ChartPanel
                title={p.spec.title}
                unit={p.unit}
                t={p.t}
                series={p.series}
                from={data.from}
                to={data.to}
                width={width}
                height={height}
                timeZone={timeZone}
                syncKey={syncKey}
                bands={bands}
                refLines={p.spec.key === "pressure" ? refLines : undefined}
                hasHtmlLabels={i === 0}
                onZoom={onZoom}
              />
              {p.spec.key === "pressure" && (
                <div className="text-xs text-ink-soft" data-testid="valve-lines-legend">
                  {refLines.length > 0 ? (
                    <>
                      <p>
                        Valve reference lines at the recent tubing pressure
                        {recentTubing != null && <> of {formatPressure(recentTubing, unitSystem)}</>}: dashed = surface opening
                        pressure, dotted = surface closing pressure.
                      </p>
                      <ul className="flex flex-wrap gap-x-3">
                        {refLines.map((l) => (
                          <li key={l.key} style={{ color: l.style === "open" ? VALVE_LINE_OPEN : VALVE_LINE_CLOSE }}>{l.label}</li>
                        ))}
                      </ul>
                    </>
                  ) : (
                    <p>No valve reference lines: {recentTubing == null ? "no recent tubing pressure in this range" : "no valve with opening and closing pressures on file"}.</p>
                  )}
                  {op && <p className="font-medium text-ink" data-testid="operating-valve">{op.label}</p>}
                </div>
              )}
            </div>
          ))}
      </div>

      {data && (
        <p className="text-xs text-ink-soft">
          {resolutionText} Shaded: issue windows{highlightIssueId !== undefined ? " (the selected issue in red)" : ""}. Hatched: pad-wide field events. Units: {pressureUnit},{" "}
          {DISPLAY_UNITS[unitSystem].gas_rate}, {DISPLAY_UNITS[unitSystem].liquid_rate}.
        </p>
      )}
      {data && <ChartNumbersTable panels={numbers} timeZone={timeZone} note={resolutionText} />}
      <CautionNote compact />
    </div>
  );
}

function ChartButton({ children, onClick, disabled }: { children: React.ReactNode; onClick: () => void; disabled?: boolean }) {
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled}
      className="rounded border border-line bg-paper-raised px-2.5 py-1 text-sm hover:border-ink-faint disabled:cursor-not-allowed disabled:opacity-50"
    >
      {children}
    </button>
  );
}
