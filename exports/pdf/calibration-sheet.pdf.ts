import PDFDocument from 'pdfkit';
import {
  CALIBRATION_PAPER_MM, FIELD_RGB, SCALE_BAR_MM, calibrationLayout,
  type CalibrationKind, type CalibrationLayout, type CalibrationPaper,
} from '@shared/calibration/calibration-sheet';
import { studioFormat, type Language } from '@shared/format/studio-format';
import { MM_PER_INCH } from '@shared/units';
import type { TFunction } from 'i18next';
import { documentWords } from '../document-words';
import type { UnitSystem } from '../types';
import { BOLD_FONT, BODY_FONT, useSeamrunFonts } from './pdf-fonts';

const PT_PER_MM = 72 / 25.4;
type Doc = InstanceType<typeof PDFDocument>;

/** Options for {@link calibrationSheetPdf}. */
export interface CalibrationPdfOptions {
  kind: CalibrationKind;
  /** Paper to print on. A border prints tiled onto this paper, or on one page of its own size with `whole`. */
  paper: CalibrationPaper | 'whole';
  /** Language of the words printed; default English. */
  language?: Language;
  /** Units of the lengths printed and of the check bar (100 mm, or 4 in); default metric. */
  unitSystem?: UnitSystem;
  /** Document dates; default the Unix epoch so the same input gives the same bytes. */
  creationDate?: Date;
  uncompressed?: boolean;
}

/** One page of a tiled border: the frame area it prints (mm, y down) and its label. */
export interface BorderTile {
  label: string;
  row: number;
  col: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

const TILE_MARGIN_MM = 10;
const TILE_OVERLAP_MM = 10;

/**
 * Pages of a border frame tiled onto paper: each page prints `paper − 2·10 mm`, neighbours overlap 10 mm;
 * pages that would fall wholly inside the opening are left out. Rows top to bottom (A, B, …), columns left
 * to right (1, 2, …).
 */
export function planBorderTiles(layout: CalibrationLayout, paper: CalibrationPaper): BorderTile[] {
  const pw = CALIBRATION_PAPER_MM[paper].w - 2 * TILE_MARGIN_MM, ph = CALIBRATION_PAPER_MM[paper].h - 2 * TILE_MARGIN_MM;
  const stepX = pw - TILE_OVERLAP_MM, stepY = ph - TILE_OVERLAP_MM;
  const cols = Math.max(1, Math.ceil((layout.width - TILE_OVERLAP_MM) / stepX));
  const rows = Math.max(1, Math.ceil((layout.height - TILE_OVERLAP_MM) / stepY));
  const f = layout.field;
  const tiles: BorderTile[] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const x = c * stepX, y = r * stepY;
      const inside = x >= f.x && y >= f.y && x + pw <= f.x + f.w && y + ph <= f.y + f.h;
      if (!inside) tiles.push({ label: `${String.fromCharCode(65 + r)}${c + 1}`, row: r, col: c, x, y, w: pw, h: ph });
    }
  }
  return tiles;
}

/** The words and lengths of one sheet: its language, and millimetres or inches to 1/8. */
interface Words {
  t: TFunction;
  /** A length as printed: `5 mm`, or `1/4"`. */
  length: (mm: number) => string;
  /** A bare number of millimetres (the unit follows), or a length in inches. */
  bare: (mm: number) => string;
  imperial: boolean;
}

function wordsOf(options: CalibrationPdfOptions): Words {
  const imperial = options.unitSystem === 'imperial';
  const f = studioFormat({ unitSystem: 'imperial', currency: 'XXX', language: options.language ?? 'en', timeZone: 'UTC' });
  const length = (mm: number) => (imperial ? f.length(mm) : `${mm} mm`);
  return { t: documentWords(options.language), length, bare: (mm) => (imperial ? f.length(mm) : `${mm}`), imperial };
}

/** The check bar's length: 100 mm, or 4 in for a studio that measures with an inch ruler. */
const barLength = (w: Words) => (w.imperial ? 4 * MM_PER_INCH : SCALE_BAR_MM);

function drawMarks(doc: Doc, layout: CalibrationLayout): void {
  for (const m of layout.marks) {
    doc.rect(m.cx - m.outerMm / 2, m.cy - m.outerMm / 2, m.outerMm, m.outerMm).fill('#000000');
    doc.rect(m.cx - m.holeMm / 2, m.cy - m.holeMm / 2, m.holeMm, m.holeMm).fill('#ffffff');
    for (const d of m.dots) doc.rect(d.x - m.dotMm / 2, d.y - m.dotMm / 2, m.dotMm, m.dotMm).fill('#000000');
  }
}

function drawScaleBar(doc: Doc, layout: CalibrationLayout, textSize: number, w: Words): void {
  const { x, y } = layout.scaleBar;
  const bar = barLength(w);
  doc.rect(x, y, bar, 1.2).fill('#000000');
  // Ticks every 10 mm (long every 50), or every 1/4 in (long every inch).
  const [step, count, every] = w.imperial ? [MM_PER_INCH / 4, 16, 4] : [10, 10, 5];
  for (let k = 0; k <= count; k++) doc.rect(x + k * step - 0.15, y - (k % every === 0 ? 3 : 1.5), 0.3, k % every === 0 ? 3 : 1.5).fill('#000000');
  doc.fillColor('#000000').font(BOLD_FONT).fontSize(textSize)
    .text(w.t('calibration.bar', { length: w.length(bar) }), x, y + 2.2, { width: Math.max(bar, 150), lineBreak: false });
}

/** The whole layout at sheet coordinates (mm); the caller has scaled the page to mm and clipped it. */
function drawLayout(doc: Doc, layout: CalibrationLayout, paperName: string, w: Words): void {
  const f = layout.field;
  const { t } = w;
  if (layout.kind === 'sheet') {
    doc.rect(f.x, f.y, f.w, f.h).fill(`#${FIELD_RGB.map((v) => v.toString(16).padStart(2, '0')).join('')}`);
    drawMarks(doc, layout);
    drawScaleBar(doc, layout, 2.6, w);
    doc.fillColor('#000000').font(BODY_FONT).fontSize(2.5)
      .text(t('calibration.sheetPrint', { paper: t(`calibration.papers.${paperName}`) }), 24, layout.height - 22, { width: layout.width - 48, lineBreak: false })
      .text(t('calibration.sheetLay', { clear: w.length(5) }), 24, layout.height - 18, { width: layout.width - 48 });
    return;
  }
  // Border: the opening's edge is the line to cut along; the band carries the marks and the scale bar.
  doc.lineWidth(0.4).dash(3, { space: 2 }).rect(f.x, f.y, f.w, f.h).stroke('#000000').undash();
  drawMarks(doc, layout);
  drawScaleBar(doc, layout, 4, w);
  doc.fillColor('#000000').font(BODY_FONT).fontSize(4)
    .text(t('calibration.borderSize', { width: w.bare(layout.width), height: w.length(layout.height), openWidth: w.bare(f.w), openHeight: w.length(f.h) }), f.x + 20, layout.height - f.y + 12, { width: f.w - 40, lineBreak: false })
    .text(t('calibration.borderLay', { clear: w.length(10) }), f.x + 20, layout.height - f.y + 19, { width: f.w - 40, lineBreak: false });
}

/**
 * A calibration sheet as a PDF (pdfkit): an A4 or Letter page with four corner marks, the blue field the
 * piece lies on and a 100 mm scale-check bar; or the border frame for a large piece, on one page of its own
 * size (`paper: 'whole'`, for a plotter) or tiled onto A4/Letter pages with a first page of instructions and
 * alignment crosses in each overlap. Resolves to the PDF bytes; the same options give the same bytes.
 */
export function calibrationSheetPdf(options: CalibrationPdfOptions): Promise<Buffer> {
  const paper = options.paper === 'whole' ? 'A4' : options.paper;
  const layout = calibrationLayout(options.kind, paper);
  const date = options.creationDate ?? new Date(0);
  const w = wordsOf(options);
  const { t } = w;
  const doc = new PDFDocument({ margin: 0, autoFirstPage: false, compress: !options.uncompressed, info: { Title: t(options.kind === 'sheet' ? 'calibration.sheetTitle' : 'calibration.borderTitle'), CreationDate: date, ModDate: date } });
  useSeamrunFonts(doc);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  if (options.kind === 'sheet' || options.paper === 'whole') {
    doc.addPage({ size: [layout.width * PT_PER_MM, layout.height * PT_PER_MM] });
    doc.scale(PT_PER_MM);
    drawLayout(doc, layout, options.paper === 'whole' ? 'whole' : paper, w);
  } else {
    const { w: pageW, h } = CALIBRATION_PAPER_MM[paper];
    const tiles = planBorderTiles(layout, paper);
    doc.addPage({ size: [pageW * PT_PER_MM, h * PT_PER_MM] });
    doc.scale(PT_PER_MM);
    doc.font(BOLD_FONT).fontSize(6).text(t('calibration.borderTitle'), 15, 15);
    doc.font(BODY_FONT).fontSize(3.5).text(t('calibration.pages', { count: tiles.length, bar: w.length(barLength(w)) }), 15, 26, { width: pageW - 30 });
    const cell = Math.min(14, (pageW - 30) / Math.max(...tiles.map((tile) => tile.col + 1)));
    doc.lineWidth(0.3);
    for (const tile of tiles) {
      doc.rect(15 + tile.col * cell, 60 + tile.row * cell, cell, cell).stroke('#000000');
      doc.fontSize(3).fillColor('#000000').text(tile.label, 16 + tile.col * cell, 61 + tile.row * cell);
    }
    for (const tile of tiles) {
      doc.addPage({ size: [pageW * PT_PER_MM, h * PT_PER_MM] });
      doc.scale(PT_PER_MM);
      doc.save().rect(TILE_MARGIN_MM, TILE_MARGIN_MM, tile.w, tile.h).clip();
      doc.translate(TILE_MARGIN_MM - tile.x, TILE_MARGIN_MM - tile.y);
      drawLayout(doc, layout, paper, w);
      doc.restore();
      doc.lineWidth(0.2).rect(TILE_MARGIN_MM, TILE_MARGIN_MM, tile.w, tile.h).stroke('#000000');
      for (const [x, y] of [[TILE_OVERLAP_MM, TILE_OVERLAP_MM], [tile.w - TILE_OVERLAP_MM, TILE_OVERLAP_MM], [TILE_OVERLAP_MM, tile.h - TILE_OVERLAP_MM], [tile.w - TILE_OVERLAP_MM, tile.h - TILE_OVERLAP_MM]]) {
        const cx = TILE_MARGIN_MM + x, cy = TILE_MARGIN_MM + y;
        doc.moveTo(cx - 4, cy).lineTo(cx + 4, cy).moveTo(cx, cy - 4).lineTo(cx, cy + 4).stroke('#000000');
      }
      doc.fontSize(4).fillColor('#000000').text(w.t('calibration.page', { label: tile.label }), TILE_MARGIN_MM + 2, 4, { lineBreak: false });
    }
  }
  doc.end();
  return done;
}
