/**
 * The temperature profile as a line chart drawn with PDF paths (no raster, no chart library): process
 * and coolant temperature against the position along the flow path, with ruled axes, ticks, axis titles
 * in the reader's units and a legend. Where the profile has no coolant curve (several tube passes: the
 * coolant has no single position along the tube path; a bath) the cold side is drawn as dashed levels.
 */
import { fromSI, type UnitSystem } from '../../../shared/thermal/units';
import { COLOR, CONTENT_WIDTH, PAGE, ensureSpace } from './document';
import { FONT } from './fonts';
import { formatNumber } from './quantities';

export interface ProfileChart {
  profile: { x_m: number; process_C: number; coolant_C?: number }[];
  units: UnitSystem;
  processLabel: string;
  coolantLabel: string;
  /** cold-side levels (coolant inlet and outlet, a bath's wall temperature) when the profile has no coolant curve */
  levels?: { label: string; temp_C: number }[];
  height?: number;
}

const HOT = '#b3401e';
const COLD = '#1f6f8b';
const COLD_2 = '#6fb0ba';

/** 1, 2, 2.5 or 5 × 10^k: a tick step giving about `count` ticks over `span`. */
function niceStep(span: number, count: number): number {
  const raw = span / Math.max(count, 1);
  const p = 10 ** Math.floor(Math.log10(raw));
  return ([1, 2, 2.5, 5, 10].find((m) => m * p >= raw) ?? 10) * p;
}

function ticks(lo: number, hi: number, count: number): number[] {
  const step = niceStep(hi - lo || 1, count);
  const out: number[] = [];
  for (let v = Math.floor(lo / step) * step; v <= hi + step * 1e-9; v += step) if (v >= lo - step * 1e-9) out.push(Number(v.toPrecision(12)));
  return out;
}

/** Draws the chart at the cursor, full content width; leaves the cursor below it. */
export function drawProfileChart(doc: PDFKit.PDFDocument, c: ProfileChart): void {
  if (c.profile.length < 2) return;
  const height = c.height ?? 230;
  ensureSpace(doc, height + 20);
  const xUnit = c.units === 'US' ? 'ft' : 'm';
  const tLabel = fromSI(0, 'temperature', c.units).label;
  const X = (m: number) => fromSI(m, 'length', { unit: xUnit }).value;
  const T = (celsius: number) => fromSI(celsius, 'temperature', c.units).value;
  const hot = c.profile.map((p) => ({ x: X(p.x_m), y: T(p.process_C) }));
  const cold = c.profile.filter((p) => p.coolant_C !== undefined).map((p) => ({ x: X(p.x_m), y: T(p.coolant_C!) }));
  const levels = cold.length === 0 ? (c.levels ?? []).map((l, i) => ({ label: l.label, y: T(l.temp_C), color: i === 0 ? COLD : COLD_2 })) : [];

  const ys = [...hot, ...cold].map((p) => p.y).concat(levels.map((l) => l.y));
  // a little room above and below the curves, so no line runs along an axis
  const pad = 0.04 * (Math.max(...ys) - Math.min(...ys) || 1);
  const yTicks = ticks(Math.min(...ys) - pad, Math.max(...ys) + pad, 5);
  const xTicks = ticks(Math.min(...hot.map((p) => p.x)), Math.max(...hot.map((p) => p.x)), 6);
  const [y0, y1] = [Math.min(yTicks[0]!, Math.min(...ys) - pad), Math.max(yTicks[yTicks.length - 1]!, Math.max(...ys) + pad)];
  const [x0, x1] = [Math.min(xTicks[0]!, hot[0]!.x), Math.max(xTicks[xTicks.length - 1]!, hot[hot.length - 1]!.x)];

  const top = doc.y + 6;
  const box = { left: PAGE.left + 46, right: PAGE.left + CONTENT_WIDTH - 8, top: top + 22, bottom: top + height - 34 };
  const px = (x: number) => box.left + ((x - x0) / (x1 - x0 || 1)) * (box.right - box.left);
  const py = (y: number) => box.bottom - ((y - y0) / (y1 - y0 || 1)) * (box.bottom - box.top);

  // legend above the plot
  const legend = [{ label: c.processLabel, color: HOT, dash: false }];
  if (cold.length) legend.push({ label: c.coolantLabel, color: COLD, dash: false });
  for (const l of levels) legend.push({ label: l.label, color: l.color, dash: true });
  let lx = box.left;
  doc.font(FONT.regular).fontSize(8.5);
  for (const item of legend) {
    doc.save().moveTo(lx, top + 8).lineTo(lx + 18, top + 8).lineWidth(2).strokeColor(item.color);
    if (item.dash) doc.dash(4, { space: 3 });
    doc.stroke().restore();
    doc.fillColor(COLOR.text).text(item.label, lx + 22, top + 3.5, { lineBreak: false });
    lx += 22 + doc.widthOfString(item.label) + 18;
  }

  // grid, ticks and tick labels
  doc.lineWidth(0.4).strokeColor(COLOR.rule);
  doc.font(FONT.regular).fontSize(8).fillColor(COLOR.muted);
  for (const v of yTicks) {
    doc.moveTo(box.left, py(v)).lineTo(box.right, py(v)).stroke();
    doc.text(formatNumber(v, 4), PAGE.left, py(v) - 4, { width: 40, align: 'right', lineBreak: false });
  }
  for (const v of xTicks) {
    doc.moveTo(px(v), box.bottom).lineTo(px(v), box.bottom + 3).stroke();
    doc.text(formatNumber(v, 4), px(v) - 20, box.bottom + 5, { width: 40, align: 'center', lineBreak: false });
  }
  doc.moveTo(box.left, box.top).lineTo(box.left, box.bottom).lineTo(box.right, box.bottom).lineWidth(0.8).strokeColor(COLOR.text).stroke();

  // axis titles
  doc.font(FONT.semibold).fontSize(8.5).fillColor(COLOR.text);
  doc.text(`Position along the flow path (${xUnit})`, box.left, box.bottom + 17, { width: box.right - box.left, align: 'center', lineBreak: false });
  doc.save().rotate(-90, { origin: [PAGE.left + 4, (box.top + box.bottom) / 2] });
  doc.text(`Temperature (${tLabel})`, PAGE.left + 4 - 60, (box.top + box.bottom) / 2 - 10, { width: 120, align: 'center', lineBreak: false });
  doc.restore();

  const curve = (points: { x: number; y: number }[], color: string, dash = false) => {
    doc.save();
    points.forEach((p, i) => (i === 0 ? doc.moveTo(px(p.x), py(p.y)) : doc.lineTo(px(p.x), py(p.y))));
    doc.lineWidth(1.8).strokeColor(color);
    if (dash) doc.dash(4, { space: 3 });
    doc.stroke().restore();
  };
  curve(hot, HOT);
  if (cold.length) curve(cold, COLD);
  for (const l of levels) curve([{ x: x0, y: l.y }, { x: x1, y: l.y }], l.color, true);

  doc.x = PAGE.left;
  doc.y = top + height;
  doc.font(FONT.regular).fontSize(9.5).fillColor(COLOR.text);
}
