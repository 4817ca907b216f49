import PDFDocument from 'pdfkit';
import {
  CALIBRATION_PAPER_MM, FIELD_RGB, SCALE_BAR_MM, calibrationLayout,
  type CalibrationKind, type CalibrationLayout, type CalibrationPaper,
} from '@shared/calibration/calibration-sheet';
import { BOLD_FONT, BODY_FONT, useSeamrunFonts } from './pdf-fonts';

const PT_PER_MM = 72 / 25.4;
type Doc = InstanceType<typeof PDFDocument>;

/** Options for {@link calibrationSheetPdf}. */
export interface CalibrationPdfOptions {
  kind: CalibrationKind;
  /** Paper to print on. A border prints tiled onto this paper, or on one page of its own size with `whole`. */
  paper: CalibrationPaper | 'whole';
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

function drawMarks(doc: Doc, layout: CalibrationLayout): void {
  for (const m of layout.marks) {
    doc.rect(m.cx - m.outerMm / 2, m.cy - m.outerMm / 2, m.outerMm, m.outerMm).fill('#000000');
    doc.rect(m.cx - m.holeMm / 2, m.cy - m.holeMm / 2, m.holeMm, m.holeMm).fill('#ffffff');
    for (const d of m.dots) doc.rect(d.x - m.dotMm / 2, d.y - m.dotMm / 2, m.dotMm, m.dotMm).fill('#000000');
  }
}

function drawScaleBar(doc: Doc, layout: CalibrationLayout, textSize: number): void {
  const { x, y } = layout.scaleBar;
  doc.rect(x, y, SCALE_BAR_MM, 1.2).fill('#000000');
  for (let k = 0; k <= 10; k++) doc.rect(x + k * 10 - 0.15, y - (k % 5 === 0 ? 3 : 1.5), 0.3, k % 5 === 0 ? 3 : 1.5).fill('#000000');
  doc.fillColor('#000000').font(BOLD_FONT).fontSize(textSize)
    .text(`This bar measures ${SCALE_BAR_MM} mm: check it with a ruler before you take the photo.`, x, y + 2.2, { width: Math.max(SCALE_BAR_MM, 150), lineBreak: false });
}

/** The whole layout at sheet coordinates (mm); the caller has scaled the page to mm and clipped it. */
function drawLayout(doc: Doc, layout: CalibrationLayout, paperName: string): void {
  const f = layout.field;
  if (layout.kind === 'sheet') {
    doc.rect(f.x, f.y, f.w, f.h).fill(`#${FIELD_RGB.map((v) => v.toString(16).padStart(2, '0')).join('')}`);
    drawMarks(doc, layout);
    drawScaleBar(doc, layout, 2.6);
    doc.fillColor('#000000').font(BODY_FONT).fontSize(2.5)
      .text(`Seamrun calibration sheet, ${paperName}. Print at 100 % (no scaling).`, 24, layout.height - 22, { width: layout.width - 48, lineBreak: false })
      .text('Lay the pattern piece flat on the blue field, 5 mm clear of its edge. Photograph from above with all four corner marks in view.', 24, layout.height - 18, { width: layout.width - 48 });
    return;
  }
  // Border: the opening's edge is the line to cut along; the band carries the marks and the scale bar.
  doc.lineWidth(0.4).dash(3, { space: 2 }).rect(f.x, f.y, f.w, f.h).stroke('#000000').undash();
  drawMarks(doc, layout);
  drawScaleBar(doc, layout, 4);
  doc.fillColor('#000000').font(BODY_FONT).fontSize(4)
    .text(`Seamrun border frame, ${layout.width} × ${layout.height} mm (opening ${f.w} × ${f.h} mm). Cut out along the dashed line.`, f.x + 20, layout.height - f.y + 12, { width: f.w - 40, lineBreak: false })
    .text('Lay the frame flat on a plain table, the piece inside it 10 mm clear of the edge; photograph from above with all four corner marks in view.', f.x + 20, layout.height - f.y + 19, { width: f.w - 40, lineBreak: false });
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
  const doc = new PDFDocument({ margin: 0, autoFirstPage: false, compress: !options.uncompressed, info: { Title: options.kind === 'sheet' ? 'Seamrun calibration sheet' : 'Seamrun border frame', CreationDate: date, ModDate: date } });
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
    drawLayout(doc, layout, options.paper === 'whole' ? 'whole' : paper);
  } else {
    const { w, h } = CALIBRATION_PAPER_MM[paper];
    const tiles = planBorderTiles(layout, paper);
    doc.addPage({ size: [w * PT_PER_MM, h * PT_PER_MM] });
    doc.scale(PT_PER_MM);
    doc.font(BOLD_FONT).fontSize(6).text('Seamrun border frame', 15, 15);
    doc.font(BODY_FONT).fontSize(3.5).text(
      `${tiles.length} pages. Print at 100 % (no scaling). Trim each page along its thin frame line on the sides that meet a neighbour, ` +
        'then tape the pages together so the crosses in each overlap lie on top of each other. Cut out the opening along the dashed line. ' +
        'Check the 100 mm bar with a ruler. Lay the frame flat on a plain table with the piece inside it.',
      15, 26, { width: w - 30 },
    );
    const cell = Math.min(14, (w - 30) / Math.max(...tiles.map((t) => t.col + 1)));
    doc.lineWidth(0.3);
    for (const t of tiles) {
      doc.rect(15 + t.col * cell, 60 + t.row * cell, cell, cell).stroke('#000000');
      doc.fontSize(3).fillColor('#000000').text(t.label, 16 + t.col * cell, 61 + t.row * cell);
    }
    for (const t of tiles) {
      doc.addPage({ size: [w * PT_PER_MM, h * PT_PER_MM] });
      doc.scale(PT_PER_MM);
      doc.save().rect(TILE_MARGIN_MM, TILE_MARGIN_MM, t.w, t.h).clip();
      doc.translate(TILE_MARGIN_MM - t.x, TILE_MARGIN_MM - t.y);
      drawLayout(doc, layout, paper);
      doc.restore();
      doc.lineWidth(0.2).rect(TILE_MARGIN_MM, TILE_MARGIN_MM, t.w, t.h).stroke('#000000');
      for (const [x, y] of [[TILE_OVERLAP_MM, TILE_OVERLAP_MM], [t.w - TILE_OVERLAP_MM, TILE_OVERLAP_MM], [TILE_OVERLAP_MM, t.h - TILE_OVERLAP_MM], [t.w - TILE_OVERLAP_MM, t.h - TILE_OVERLAP_MM]]) {
        const cx = TILE_MARGIN_MM + x, cy = TILE_MARGIN_MM + y;
        doc.moveTo(cx - 4, cy).lineTo(cx + 4, cy).moveTo(cx, cy - 4).lineTo(cx, cy + 4).stroke('#000000');
      }
      doc.fontSize(4).fillColor('#000000').text(`Border frame, page ${t.label}`, TILE_MARGIN_MM + 2, 4, { lineBreak: false });
    }
  }
  doc.end();
  return done;
}
