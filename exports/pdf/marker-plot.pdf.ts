/**
 * The whole marker at 1:1 for a plotter: page width = the marker's width, one page per panel of the
 * marker's length, every placed piece's cutting line, its grain line, notches, "size piece-name", the
 * splice zones, and a title band with a check bar (100 mm, or 4 in for a studio in inches), in the studio's words and units.
 */
import PDFDocument from 'pdfkit';
import { MM_PER_INCH } from '@shared/units';
import { documentWords } from '../document-words';
import { placedOutline } from '../dxf/marker-dxf';
import type { MarkerPlotInput } from '../types';
import { formatLongLength, formatRatio, formatShortLength, parseIsoDate } from './document-format';
import { BODY_FONT, BOLD_FONT, useSeamrunFonts } from './pdf-fonts';
import { INK, TEAL, type PdfOptions } from './pdf-layout';

/** PDF points per millimetre: the default user space unit is 1/72 inch (ISO 32000-1 §8.3.2.3) and 1 in = 25.4 mm. */
export const PT_PER_MM = 72 / 25.4;
/** Longest marker length one page carries by default, mm (a PDF page is at most 200 in = 5 080 mm; ISO 32000-1 Annex C). */
export const DEFAULT_PANEL_LENGTH_MM = 5000;
/** Height of the title band above each panel, mm. */
export const PLOT_BAND_MM = 40;
/** Length of a notch tick into the piece, mm (common practice: a 1/4 in snip). */
const NOTCH_MM = 6;

type Pt = { x: number; y: number };

/**
 * Builds the plotter PDF. Marker x (along the length) runs down the page and y (across) to the right, a
 * quarter turn, so nothing is mirrored; 1 mm on the marker is exactly 1 mm on paper. A marker longer
 * than `panelLengthMm` is split into panels, one per page, each starting where the last ended (the join
 * is printed at both ends). Deterministic: the document date is the input's, never the clock.
 */
export async function buildMarkerPlotPdf(input: MarkerPlotInput, options: PdfOptions = {}): Promise<Buffer> {
  const panel = input.panelLengthMm ?? DEFAULT_PANEL_LENGTH_MM;
  if (!(panel > 0 && panel <= 5000)) throw new RangeError(`panel length must be above 0 and at most 5000 mm, got ${panel}`);
  const t = documentWords(input.language);
  const title = t('plot.title', { batch: input.batch.code, style: input.style.code });
  const doc = new PDFDocument({
    autoFirstPage: false,
    compress: options.compress ?? true,
    info: { Title: title, Author: input.studioName, Creator: 'Seamrun', CreationDate: parseIsoDate(input.dateIso), ModDate: parseIsoDate(input.dateIso) },
  });
  useSeamrunFonts(doc);
  const chunks: Buffer[] = [];
  const bytes = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const rings = input.placements.map((p) => ({ p, ring: placedOutline(input.outlines[p.pieceKey] ?? [], p) })).filter((r) => r.ring.length >= 3);
  const panels = Math.max(1, Math.ceil(input.lengthMm / panel - 1e-9));
  for (let k = 0; k < panels; k++) {
    const from = k * panel;
    const to = Math.min(input.lengthMm, from + panel);
    doc.addPage({ size: [input.widthMm * PT_PER_MM, (PLOT_BAND_MM + (to - from)) * PT_PER_MM], margin: 0 });
    drawBand(doc, input, k, panels, from, to);
    const toPage = (q: Pt) => [q.y * PT_PER_MM, (PLOT_BAND_MM + q.x - from) * PT_PER_MM] as const;
    doc.save();
    doc.rect(0, PLOT_BAND_MM * PT_PER_MM, input.widthMm * PT_PER_MM, (to - from) * PT_PER_MM).clip();
    doc.rect(0, PLOT_BAND_MM * PT_PER_MM, input.widthMm * PT_PER_MM, (to - from) * PT_PER_MM).lineWidth(1).strokeColor(INK).stroke();
    for (const { p, ring } of rings) {
      const xs = ring.map((q) => q.x);
      if (Math.max(...xs) < from || Math.min(...xs) > to) continue;
      drawPiece(doc, ring, (input.notches?.[p.pieceKey] ?? []).map((n) => placedOutline([n], p)[0]), `${p.size} ${p.pieceName}`, toPage);
    }
    for (const z of input.spliceZones ?? []) {
      drawSpliceLine(doc, z.near, t('plot.spliceNew'), from, to, input.widthMm);
      drawSpliceLine(doc, z.far, t('plot.spliceOld'), from, to, input.widthMm);
    }
    doc.restore();
  }
  doc.end();
  return bytes;
}

function drawBand(doc: PDFKit.PDFDocument, input: MarkerPlotInput, k: number, panels: number, from: number, to: number) {
  const mmPt = (n: number) => n * PT_PER_MM;
  const w = mmPt(input.widthMm);
  doc.save().rect(0, 0, w, mmPt(PLOT_BAND_MM)).fill('#FFFFFF').restore();
  const size = mmPt(5);
  const t = documentWords(input.language);
  doc.fillColor(TEAL).font(BOLD_FONT).fontSize(size).text(`${t('batch')} ${input.batch.code} · ${input.style.code} ${input.style.name} · ${formatRatio(input.ratio)}`, mmPt(5), mmPt(4), { lineBreak: false });
  doc.fillColor(INK).font(BODY_FONT).fontSize(mmPt(3.5));
  const u = input.unitSystem ?? 'metric';
  const long = (lengthMm: number) => formatLongLength(lengthMm, u, input.language, input.locale);
  const lengthText = t('plot.size', { length: long(input.lengthMm), width: formatShortLength(input.widthMm, u, input.language, input.locale) });
  const panelText = panels > 1 ? t('plot.panel', { k: k + 1, n: panels, from: long(from), to: long(to) }) : '';
  doc.text(t('plot.scale', { size: lengthText, panel: panelText }), mmPt(5), mmPt(12), { lineBreak: false });
  // Check bar: measure it on the plot with the studio's ruler; it must be exactly 100 mm, or 4 in (101.6 mm).
  const bar = u === 'imperial' ? 4 * MM_PER_INCH : 100;
  doc.save().lineWidth(mmPt(0.5)).strokeColor(INK).moveTo(mmPt(5), mmPt(26)).lineTo(mmPt(5 + bar), mmPt(26)).stroke();
  for (const x of [5, 5 + bar]) doc.moveTo(mmPt(x), mmPt(23)).lineTo(mmPt(x), mmPt(29)).stroke();
  doc.restore();
  doc.fontSize(mmPt(3)).text(t(u === 'imperial' ? 'plot.barInches' : 'plot.bar'), mmPt(10 + bar), mmPt(24.5), { lineBreak: false });
}

function drawPiece(doc: PDFKit.PDFDocument, ring: Pt[], notches: Pt[], label: string, toPage: (q: Pt) => readonly [number, number]) {
  const [x0, y0] = toPage(ring[0]);
  doc.moveTo(x0, y0);
  for (const q of ring.slice(1)) doc.lineTo(...toPage(q));
  doc.closePath().lineWidth(1).strokeColor('#B4413C').stroke();
  const xs = ring.map((q) => q.x), ys = ring.map((q) => q.y);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const cx = (minX + maxX) / 2, cy = (minY + maxY) / 2, half = (maxX - minX) * 0.3;
  // Grain line along the fabric length with an arrow head at both ends.
  const a = toPage({ x: cx - half, y: cy }), b = toPage({ x: cx + half, y: cy });
  doc.save().lineWidth(0.8).strokeColor('#2F855A').moveTo(...a).lineTo(...b).stroke();
  for (const [tip, dir] of [[a, -1], [b, 1]] as const) {
    const head = 4 * PT_PER_MM;
    doc.moveTo(tip[0] - head / 2, tip[1] - dir * head).lineTo(tip[0], tip[1]).lineTo(tip[0] + head / 2, tip[1] - dir * head).stroke();
  }
  doc.restore();
  for (const n of notches) drawNotch(doc, ring, n, toPage);
  const height = Math.max(6, Math.min(25, (maxY - minY) / 8));
  const [lx, ly] = toPage({ x: cx + height, y: cy + height * 0.6 });
  doc.fillColor(INK).font(BODY_FONT).fontSize(height * PT_PER_MM * 0.7).text(label, lx, ly, { lineBreak: false });
}

/**
 * A short tick into the piece from the point of the cutting line nearest the notch (a notch may be given
 * on the sewing line, a seam allowance inside), square to that edge.
 */
function drawNotch(doc: PDFKit.PDFDocument, ring: Pt[], notch: Pt, toPage: (q: Pt) => readonly [number, number]) {
  let best = { d: Infinity, nx: 0, ny: 0, at: notch };
  const n = notch;
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i], q = ring[(i + 1) % ring.length];
    const dx = q.x - p.x, dy = q.y - p.y, len = Math.hypot(dx, dy);
    if (len === 0) continue;
    const t = Math.max(0, Math.min(1, ((n.x - p.x) * dx + (n.y - p.y) * dy) / (len * len)));
    const d = Math.hypot(p.x + t * dx - n.x, p.y + t * dy - n.y);
    if (d < best.d) best = { d, nx: -dy / len, ny: dx / len, at: { x: p.x + t * dx, y: p.y + t * dy } };
  }
  const at = best.at;
  const inside = pointInRing(ring, { x: at.x + best.nx * 0.5, y: at.y + best.ny * 0.5 });
  const s = inside ? NOTCH_MM : -NOTCH_MM;
  doc.save().lineWidth(1).strokeColor('#B4413C').moveTo(...toPage(at)).lineTo(...toPage({ x: at.x + best.nx * s, y: at.y + best.ny * s })).stroke().restore();
}

function pointInRing(ring: Pt[], q: Pt): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i], b = ring[j];
    if (a.y > q.y !== b.y > q.y && q.x < ((b.x - a.x) * (q.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

function drawSpliceLine(doc: PDFKit.PDFDocument, at: number, text: string, from: number, to: number, widthMm: number) {
  if (at < from || at > to) return;
  const y = (PLOT_BAND_MM + at - from) * PT_PER_MM;
  doc.save().dash(4 * PT_PER_MM, { space: 3 * PT_PER_MM }).lineWidth(1).strokeColor(TEAL).moveTo(0, y).lineTo(widthMm * PT_PER_MM, y).stroke().undash().restore();
  doc.fillColor(TEAL).font(BOLD_FONT).fontSize(4 * PT_PER_MM).text(text, 3 * PT_PER_MM, y + PT_PER_MM, { lineBreak: false });
  doc.fillColor(INK);
}
