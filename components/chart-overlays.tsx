// The uPlot plugin that draws a panel's annotations on the canvas: issue windows
// shaded (the highlighted one stronger), pad-wide field events hatched with their own
// label, and horizontal reference lines (the valves' surface opening and closing
// pressures) with their text. Bands go under the curves (drawClear), lines and
// labels over them (draw).
import type uPlot from "uplot";

export interface ChartBand {
  key: string;
  start: number;
  /** Null: still going at the end of the range. */
  end: number | null;
  label: string;
  kind: "issue" | "field-event";
  isHighlighted?: boolean;
}

export interface ChartRefLine {
  key: string;
  /** In the panel's display unit. */
  value: number;
  label: string;
  style: "open" | "close";
}

// Our own palette (tailwind.config.ts): warn amber for issues, bad red for the one
// being looked at, ink slate for pad-wide events, and the soft and faint inks for the
// valve lines so they never read as the copper casing-pressure curve.
const ISSUE_FILL = "rgba(183, 121, 31, 0.13)";
const ISSUE_EDGE = "rgba(183, 121, 31, 0.55)";
const HIGHLIGHT_FILL = "rgba(178, 58, 58, 0.20)";
const HIGHLIGHT_EDGE = "rgba(178, 58, 58, 0.9)";
const EVENT_FILL = "rgba(74, 90, 110, 0.07)";
const EVENT_HATCH = "rgba(74, 90, 110, 0.35)";
export const VALVE_LINE_OPEN = "#4a5a6e";
export const VALVE_LINE_CLOSE = "#8b98a8";
const TEXT = "#1d2a3a";

function bandPixels(u: uPlot, b: ChartBand): [number, number] | null {
  const { left, width } = u.bbox;
  const xMin = u.scales.x.min ?? 0;
  const xMax = u.scales.x.max ?? 0;
  const end = b.end ?? xMax;
  if (end < xMin || b.start > xMax) return null;
  const x0 = Math.max(left, u.valToPos(Math.max(b.start, xMin), "x", true));
  const x1 = Math.min(left + width, u.valToPos(Math.min(end, xMax), "x", true));
  return [x0, Math.max(x1, x0 + 2 * uPlotRatio())];
}

function uPlotRatio(): number {
  return typeof window === "undefined" ? 1 : window.devicePixelRatio || 1;
}

function drawBands(u: uPlot, bands: readonly ChartBand[]) {
  const ctx = u.ctx;
  const { top, height } = u.bbox;
  const r = uPlotRatio();
  ctx.save();
  for (const b of bands) {
    const px = bandPixels(u, b);
    if (!px) continue;
    const [x0, x1] = px;
    if (b.kind === "field-event") {
      ctx.fillStyle = EVENT_FILL;
      ctx.fillRect(x0, top, x1 - x0, height);
      // Diagonal hatching: a pad-wide event, not a problem of this well.
      ctx.save();
      ctx.beginPath();
      ctx.rect(x0, top, x1 - x0, height);
      ctx.clip();
      ctx.strokeStyle = EVENT_HATCH;
      ctx.lineWidth = r;
      const step = 8 * r;
      for (let x = x0 - height; x < x1; x += step) {
        ctx.moveTo(x, top + height);
        ctx.lineTo(x + height, top);
      }
      ctx.stroke();
      ctx.restore();
    } else {
      ctx.fillStyle = b.isHighlighted ? HIGHLIGHT_FILL : ISSUE_FILL;
      ctx.fillRect(x0, top, x1 - x0, height);
      ctx.strokeStyle = b.isHighlighted ? HIGHLIGHT_EDGE : ISSUE_EDGE;
      ctx.lineWidth = (b.isHighlighted ? 2 : 1) * r;
      ctx.beginPath();
      ctx.moveTo(x0, top);
      ctx.lineTo(x0, top + height);
      if (b.end !== null) {
        ctx.moveTo(x1, top);
        ctx.lineTo(x1, top + height);
      }
      ctx.stroke();
    }
  }
  ctx.restore();
}

function drawBandLabels(u: uPlot, bands: readonly ChartBand[]) {
  const ctx = u.ctx;
  const r = uPlotRatio();
  ctx.save();
  ctx.font = `${11 * r}px system-ui, sans-serif`;
  ctx.textBaseline = "top";
  // Field events label from the bottom so they do not sit on an issue label.
  for (const b of bands) {
    const px = bandPixels(u, b);
    if (!px) continue;
    ctx.fillStyle = b.kind === "issue" && b.isHighlighted ? HIGHLIGHT_EDGE : TEXT;
    const y = b.kind === "issue" ? u.bbox.top + 3 * r : u.bbox.top + u.bbox.height - 16 * r;
    ctx.fillText(b.label, px[0] + 4 * r, y, Math.max(px[1] - px[0] - 6 * r, 40 * r));
  }
  ctx.restore();
}

function drawRefLines(u: uPlot, lines: readonly ChartRefLine[]) {
  const ctx = u.ctx;
  const r = uPlotRatio();
  const { left, width, top, height } = u.bbox;
  const placed = lines
    .map((l) => ({ l, y: u.valToPos(l.value, "y", true) }))
    .filter((p) => p.y >= top && p.y <= top + height)
    .sort((a, b) => a.y - b.y);
  ctx.save();
  ctx.globalAlpha = 0.75;
  ctx.lineWidth = r;
  for (const { l, y } of placed) {
    ctx.strokeStyle = l.style === "open" ? VALVE_LINE_OPEN : VALVE_LINE_CLOSE;
    ctx.setLineDash(l.style === "open" ? [6 * r, 4 * r] : [2 * r, 3 * r]);
    ctx.beginPath();
    ctx.moveTo(left, y);
    ctx.lineTo(left + width, y);
    ctx.stroke();
  }
  // Valves set 10-25 psi apart crowd their lines; a label that would overprint the
  // one above is left out here (every label is listed under the panel).
  ctx.globalAlpha = 1;
  ctx.font = `${10 * r}px system-ui, sans-serif`;
  ctx.textAlign = "right";
  ctx.textBaseline = "bottom";
  let lastY = -Infinity;
  for (const { l, y } of placed) {
    if (y - lastY < 12 * r) continue;
    // A paper-coloured backing keeps the text readable over the other dashed lines.
    const w = ctx.measureText(l.label).width;
    ctx.fillStyle = "rgba(255, 255, 255, 0.85)";
    ctx.fillRect(left + width - 6 * r - w, y - 12 * r, w + 4 * r, 11 * r);
    ctx.fillStyle = l.style === "open" ? VALVE_LINE_OPEN : VALVE_LINE_CLOSE;
    ctx.fillText(l.label, left + width - 4 * r, y - r);
    lastY = y;
  }
  ctx.restore();
}

/** `hasCanvasLabels: false` where the panel shows the band labels as HTML instead. */
export function makeOverlayPlugin(
  getBands: () => readonly ChartBand[],
  getLines: () => readonly ChartRefLine[],
  options: { hasCanvasLabels?: boolean } = {},
): uPlot.Plugin {
  return {
    hooks: {
      drawClear: (u) => drawBands(u, getBands()),
      draw: (u) => {
        drawRefLines(u, getLines());
        if (options.hasCanvasLabels ?? true) drawBandLabels(u, getBands());
      },
    },
  };
}
