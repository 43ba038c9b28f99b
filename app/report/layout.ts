/**
 * A small flow layout over a pdfkit document: headings, paragraphs and tables that break onto
 * new pages (a table repeats its header row), with the record's two fonts.
 */
import type { VerdictCode } from '../review/results';
import { drawVerdictIcon } from './icons';
import { FAINT, GREY, INK, RULE } from './words';

type Doc = PDFKit.PDFDocument;

export const FONT_REGULAR = 'FlankfilmSans';
export const FONT_BOLD = 'FlankfilmSans-Bold';

export interface CellSpec {
  text: string;
  bold?: boolean;
  color?: string;
  /** A verdict icon before the text. */
  icon?: VerdictCode;
}
export type Cell = string | CellSpec;

export interface Column {
  header: string;
  /** Share of the table width; the shares are normalised. */
  width: number;
  align?: 'left' | 'right' | 'center';
}

export interface TableOptions {
  fontSize?: number;
  /** Shade every other row. */
  zebra?: boolean;
  /** Cells of the first column in bold. */
  boldFirstColumn?: boolean;
}

const cellOf = (c: Cell): CellSpec => (typeof c === 'string' ? { text: c } : c);

export class Layout {
  readonly doc: Doc;
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;

  constructor(doc: Doc) {
    this.doc = doc;
    const m = doc.page.margins;
    this.left = m.left;
    this.right = doc.page.width - m.right;
    this.top = m.top;
    this.bottom = doc.page.height - m.bottom;
  }

  get width(): number {
    return this.right - this.left;
  }
  get y(): number {
    return this.doc.y;
  }
  set y(v: number) {
    this.doc.y = v;
  }
  get room(): number {
    return this.bottom - this.doc.y;
  }

  newPage(): void {
    this.doc.addPage();
    this.doc.x = this.left;
    this.doc.y = this.top;
  }

  /** Start a new page unless `h` points fit below the current position. */
  ensure(h: number): void {
    if (this.doc.y + h > this.bottom) this.newPage();
  }

  font(bold: boolean, size: number, color = INK): Doc {
    return this.doc
      .font(bold ? FONT_BOLD : FONT_REGULAR)
      .fontSize(size)
      .fillColor(color);
  }

  heading(text: string, level: 1 | 2 | 3 = 1): void {
    const size = level === 1 ? 15 : level === 2 ? 11.5 : 10;
    const before = level === 1 ? 4 : 8;
    this.ensure(before + size * 1.4 + 40);
    this.doc.y += before;
    this.font(true, size).text(text, this.left, this.doc.y, { width: this.width });
    if (level === 1) {
      const y = this.doc.y + 1;
      this.doc.moveTo(this.left, y).lineTo(this.right, y).lineWidth(0.6).strokeColor(RULE).stroke();
      this.doc.y = y + 6;
    } else {
      this.doc.y += 2;
    }
  }

  para(text: string, opts: { size?: number; bold?: boolean; color?: string; indent?: number; gap?: number } = {}): void {
    const size = opts.size ?? 9;
    const indent = opts.indent ?? 0;
    this.font(opts.bold ?? false, size, opts.color ?? INK);
    const h = this.doc.heightOfString(text, { width: this.width - indent, lineGap: 1.5 });
    if (h < 60) this.ensure(h);
    this.doc.text(text, this.left + indent, this.doc.y, { width: this.width - indent, lineGap: 1.5 });
    this.doc.y += opts.gap ?? 4;
  }

  /** A bulleted list item. */
  bullet(text: string, opts: { size?: number; color?: string; marker?: string } = {}): void {
    const size = opts.size ?? 9;
    const indent = 11;
    this.font(false, size, opts.color ?? INK);
    const h = this.doc.heightOfString(text, { width: this.width - indent, lineGap: 1.5 });
    if (h < 60) this.ensure(h);
    const y = this.doc.y;
    this.doc.text(opts.marker ?? '•', this.left, y, { width: indent, lineBreak: false });
    this.doc.text(text, this.left + indent, y, { width: this.width - indent, lineGap: 1.5 });
    this.doc.y += 2.5;
  }

  /** Label–value pairs, in one pair of columns or (`pairs: 2`) two side by side, filled down then across. */
  keyValues(rows: Array<[string, string]>, opts: { labelShare?: number; size?: number; pairs?: 1 | 2; header?: [string, string]; valueAlign?: 'left' | 'right' } = {}): void {
    const pairs = opts.pairs ?? 1;
    const share = (opts.labelShare ?? 0.38) / pairs;
    const [hl, hv] = opts.header ?? ['', ''];
    const columns: Column[] = [];
    for (let i = 0; i < pairs; i++) columns.push({ header: hl, width: share }, { header: hv, width: 1 / pairs - share, align: opts.valueAlign ?? 'left' });
    const n = Math.ceil(rows.length / pairs);
    const table: string[][] = [];
    for (let r = 0; r < n; r++) {
      const line: string[] = [];
      for (let c = 0; c < pairs; c++) line.push(...(rows[r + c * n] ?? ['', '']));
      table.push(line);
    }
    this.table(columns, table, { fontSize: opts.size ?? 8.5, zebra: true }, opts.header !== undefined);
  }

  table(columns: Column[], rows: Cell[][], opts: TableOptions = {}, header = true): void {
    const doc = this.doc;
    const size = opts.fontSize ?? 8;
    const pad = 2.5;
    const total = columns.reduce((s, c) => s + c.width, 0);
    const widths = columns.map((c) => (c.width / total) * this.width);
    const iconSize = size * 1.05;

    const rowHeight = (cells: CellSpec[], bold: boolean): number => {
      let h = 0;
      cells.forEach((c, i) => {
        const w = (widths[i] ?? 0) - 2 * pad - (c.icon ? iconSize + 3 : 0);
        doc.font(bold || c.bold ? FONT_BOLD : FONT_REGULAR).fontSize(size);
        h = Math.max(h, doc.heightOfString(c.text || ' ', { width: Math.max(4, w), lineGap: 0.5 }));
      });
      return h + 2 * pad;
    };

    // `h`: the row's height when the caller has measured it already (text layout is the record's main cost).
    const drawRow = (cells: CellSpec[], bold: boolean, shade: string | null, h: number = rowHeight(cells, bold)): void => {
      const y = doc.y;
      if (shade) doc.rect(this.left, y, this.width, h).fillColor(shade).fill();
      let x = this.left;
      cells.forEach((c, i) => {
        const w = widths[i] ?? 0;
        let tx = x + pad;
        let tw = w - 2 * pad;
        if (c.icon) {
          drawVerdictIcon(doc, c.icon, tx, y + pad + 0.5, iconSize);
          tx += iconSize + 3;
          tw -= iconSize + 3;
        }
        doc
          .font(bold || c.bold ? FONT_BOLD : FONT_REGULAR)
          .fontSize(size)
          .fillColor(c.color ?? INK)
          .text(c.text, tx, y + pad, { width: Math.max(4, tw), align: columns[i]?.align ?? 'left', lineGap: 0.5 });
        x += w;
      });
      doc.y = y + h;
    };

    const headerCells = columns.map((c) => ({ text: c.header, bold: true, color: INK }));
    const headerH = header ? rowHeight(headerCells, true) : 0;
    const drawHeader = (): void => {
      if (!header) return;
      drawRow(headerCells, true, null, headerH);
      doc.moveTo(this.left, doc.y).lineTo(this.right, doc.y).lineWidth(0.6).strokeColor(GREY).stroke();
    };

    const firstH = rows[0] ? rowHeight(rows[0].map(cellOf), false) : 0;
    this.ensure(headerH + firstH + 2);
    drawHeader();
    rows.forEach((r, ri) => {
      const cells = r.map(cellOf).map((c, i) => (i === 0 && opts.boldFirstColumn ? { ...c, bold: true } : c));
      const h = rowHeight(cells, false);
      if (doc.y + h > this.bottom) {
        this.newPage();
        drawHeader();
      }
      drawRow(cells, false, opts.zebra && ri % 2 === 1 ? FAINT : null, h);
    });
    doc.moveTo(this.left, doc.y).lineTo(this.right, doc.y).lineWidth(0.4).strokeColor(RULE).stroke();
    doc.x = this.left;
    doc.y += 6;
  }
}
