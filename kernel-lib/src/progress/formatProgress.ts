/**
 * Text and HTML renderings of a progress snapshot: a live line (count, per cent, rate, time left)
 * and, when the work ends, a one-line summary. Every user string is escaped in the HTML.
 */
import { escapeHtml } from "../display/escapeHtml.js";
import { formatSignificant } from "../tables/formatNumber.js";
import { INK } from "../charts/theme.js";
import type { ProgressSnapshot } from "./progressTypes.js";

/** Human duration: "0.4 s", "12 s", "3 min 05 s", "1 h 02 min". */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return "?";
  if (seconds < 10) return `${seconds.toFixed(1)} s`;
  if (seconds < 60) return `${Math.round(seconds)} s`;
  if (seconds < 3600) {
    const m = Math.floor(seconds / 60);
    const s = Math.round(seconds - 60 * m);
    return s === 60 ? `${m + 1} min 00 s` : `${m} min ${String(s).padStart(2, "0")} s`;
  }
  const h = Math.floor(seconds / 3600);
  const m = Math.round((seconds - 3600 * h) / 60);
  return m === 60 ? `${h + 1} h 00 min` : `${h} h ${String(m).padStart(2, "0")} min`;
}

function count(n: number): string {
  return n.toLocaleString("en-US");
}

function rate(r: number): string {
  if (!(r > 0)) return "–/s";
  // Three significant figures; thousands grouped so 12500 reads "12,500".
  return r >= 1000
    ? `${Number(r.toPrecision(3)).toLocaleString("en-US")}/s`
    : `${formatSignificant(r, { digits: 3 })}/s`;
}

/** One plain-text line for a snapshot (live or final). */
export function progressLine(s: ProgressSnapshot): string {
  if (s.status === "done") {
    return `${s.label}: ${count(s.done)} ${s.unit} in ${formatDuration(s.elapsedSeconds)} (${rate(s.ratePerSecond)})`;
  }
  if (s.status === "failed") {
    return `${s.label}: failed after ${count(s.done)} ${s.unit} in ${formatDuration(s.elapsedSeconds)}: ${s.failure ?? "error"}`;
  }
  const of = s.total !== undefined ? ` of ${count(s.total)}` : "";
  const pct = s.total ? ` (${((100 * s.done) / s.total).toFixed(1)} %)` : "";
  const left =
    s.remainingSeconds !== undefined ? `, ${formatDuration(s.remainingSeconds)} left` : "";
  return `${s.label}: ${count(s.done)}${of} ${s.unit}${pct}, ${rate(s.ratePerSecond)}${left}`;
}

/** An HTML fragment for a notebook output: a bar while running, one line when finished. */
export function progressHtml(s: ProgressSnapshot): string {
  const line = escapeHtml(progressLine(s));
  const font = "font-family:inherit;font-size:12.5px";
  if (s.status !== "running") {
    const color = s.status === "failed" ? INK.critical : "#4d4a44";
    return `<div class="isochor-progress" style="${font};color:${color}">${line}</div>`;
  }
  const fraction = s.total ? Math.min(1, s.done / s.total) : undefined;
  const bar =
    fraction !== undefined
      ? `<div style="height:5px;width:260px;background:${INK.grid};border-radius:3px;margin-top:3px">` +
        `<div style="height:5px;width:${(100 * fraction).toFixed(1)}%;background:#332288;border-radius:3px"></div></div>`
      : "";
  return `<div class="isochor-progress" style="${font};color:${INK.dome}">${line}${bar}</div>`;
}
