"use client";
// One uPlot panel of the trend chart. The chart is created in an effect (uPlot needs
// the DOM) and rebuilt when its data or options change; panels sharing `syncKey`
// move one cursor together. Drag-select does not zoom locally: it reports the range
// so the parent can fetch finer data for it. Issue windows also get an HTML label
// inside the plot overlay so assistive technology and tests can read them.
import { useEffect, useRef, useState } from "react";
import { createPortal } from "react-dom";
import type uPlot from "uplot";
import "uplot/dist/uPlot.min.css";
import { makeOverlayPlugin, type ChartBand, type ChartRefLine } from "./chart-overlays";

export interface PanelSeries {
  label: string;
  color: string;
  isShown: boolean;
  values: (number | null | undefined)[];
}

export interface ChartPanelProps {
  title: string;
  unit: string;
  t: number[];
  series: PanelSeries[];
  from: number;
  to: number;
  width: number;
  height: number;
  timeZone: string;
  syncKey: string;
  bands: ChartBand[];
  refLines?: ChartRefLine[];
  /** Render the HTML labels of the bands (once per chart is enough). */
  hasHtmlLabels?: boolean;
  onZoom: (from: number, to: number) => void;
}

/** Shortest range a drag can ask for: below this the raw values are all there anyway. */
const MIN_ZOOM_MS = 10 * 60_000;

export function ChartPanel(props: ChartPanelProps) {
  const holder = useRef<HTMLDivElement>(null);
  const [over, setOver] = useState<{ el: HTMLElement; plotWidth: number } | null>(null);
  const onZoom = useRef(props.onZoom);
  useEffect(() => {
    onZoom.current = props.onZoom;
  });

  const { t, series, from, to, width, height, timeZone, syncKey, bands, refLines, unit, hasHtmlLabels } = props;
  useEffect(() => {
    let chart: uPlot | null = null;
    let isCancelled = false;
    void import("uplot").then(({ default: U }) => {
      if (isCancelled || !holder.current) return;
      const lines = refLines ?? [];
      const opts: uPlot.Options = {
        width,
        height,
        ms: 1,
        tzDate: (ts) => U.tzDate(new Date(ts), timeZone),
        cursor: {
          sync: { key: syncKey },
          drag: { x: true, y: false, setScale: false },
        },
        scales: {
          x: { time: true, range: () => [from, to] },
          y: {
            // Keep the valve lines in view: an engineer reads casing pressure against them.
            range: (_u, dmin, dmax) => {
              const vals = [dmin, dmax, ...lines.map((l) => l.value)].filter((v) => Number.isFinite(v));
              if (vals.length === 0) return [0, 1];
              const lo = Math.min(...vals);
              const hi = Math.max(...vals);
              const pad = Math.max((hi - lo) * 0.06, Math.abs(hi) * 0.01, 1);
              return [lo - pad, hi + pad];
            },
          },
        },
        axes: [
          { stroke: "#4a5a6e", grid: { stroke: "#eceee9" }, ticks: { stroke: "#d8dcd6" } },
          { stroke: "#4a5a6e", grid: { stroke: "#eceee9" }, ticks: { stroke: "#d8dcd6" }, label: unit, size: 64 },
        ],
        series: [
          { label: `Time (${timeZone})` },
          ...series.map((s) => ({ label: `${s.label} (${unit})`, stroke: s.color, width: 1.5, show: s.isShown, spanGaps: false, points: { show: false } })),
        ],
        legend: { live: true },
        plugins: [makeOverlayPlugin(() => bands, () => lines, { hasCanvasLabels: !hasHtmlLabels })],
        hooks: {
          setSelect: [
            (u) => {
              const sel = u.select;
              if (sel.width > 3) {
                const a = u.posToVal(sel.left, "x");
                const b = u.posToVal(sel.left + sel.width, "x");
                if (b - a >= MIN_ZOOM_MS) onZoom.current(Math.round(a), Math.round(b));
                else onZoom.current(Math.round((a + b) / 2 - MIN_ZOOM_MS / 2), Math.round((a + b) / 2 + MIN_ZOOM_MS / 2));
              }
              u.setSelect({ left: 0, top: 0, width: 0, height: 0 }, false);
            },
          ],
          ready: [(u) => setOver({ el: u.over, plotWidth: u.over.clientWidth })],
        },
      };
      const data = [t, ...series.map((s) => s.values)] as unknown as uPlot.AlignedData;
      chart = new U(opts, data, holder.current);
    });
    return () => {
      isCancelled = true;
      chart?.destroy();
      setOver(null);
    };
  }, [t, series, from, to, width, height, timeZone, syncKey, bands, refLines, unit, hasHtmlLabels]);

  const labels = hasHtmlLabels && over ? bandLabels(bands, from, to, over.plotWidth) : [];
  return (
    <figure className="space-y-1" aria-label={props.title}>
      <figcaption className="text-xs font-semibold uppercase tracking-wide text-ink-soft">{props.title}</figcaption>
      {/* The legend is read-only: the checkboxes above choose the signals. */}
      <div ref={holder} className="[&_.u-legend]:pointer-events-none [&_.u-legend]:text-xs" />
      {over &&
        labels.length > 0 &&
        createPortal(
          <>
            {labels.map((l) => (
              <span
                key={l.key}
                data-testid={l.kind === "issue" ? "issue-window-label" : "field-event-label"}
                data-highlighted={l.isHighlighted ? "true" : undefined}
                className={`pointer-events-none absolute rounded px-1 text-[11px] leading-4 ${
                  l.kind === "issue"
                    ? l.isHighlighted
                      ? "bg-bad text-paper-raised"
                      : "bg-warn/90 text-paper-raised"
                    : "bg-ink-soft/80 text-paper-raised"
                }`}
                style={{ left: l.left, top: l.kind === "issue" ? 2 : undefined, bottom: l.kind === "issue" ? undefined : 2 }}
              >
                {l.label}
              </span>
            ))}
          </>,
          over.el,
        )}
    </figure>
  );
}

/** Where each band's HTML label goes, in CSS pixels from the plot's left edge. */
function bandLabels(bands: readonly ChartBand[], from: number, to: number, plotWidth: number) {
  return bands
    .filter((b) => (b.end ?? to) >= from && b.start <= to)
    .map((b) => ({ ...b, left: Math.round(((Math.max(b.start, from) - from) / (to - from)) * plotWidth) + 2 }));
}
