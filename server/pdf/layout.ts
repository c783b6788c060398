import { POINT_MM } from '@shared/units';
import type { jsPDF } from 'jspdf';
import { type FontKind, newA4Document, runsOf, setFace } from './fonts';

/*
 * A small flow layout over jsPDF for the sheet: A4 portrait in millimetres, a cursor that moves down the
 * page, page breaks, wrapped text in the sheet's faces, ruled tables (heavy rule under the head, hairlines
 * between rows — the same look as the screen), and vector glyphs for pass / fail / not evaluated.
 */

export const PAGE = { width: 210, height: 297, left: 16, right: 16, top: 16, bottom: 22 } as const;

/** The product's ink colours (see src/styles.css), printed on white. */
export const INK = {
  ink: '#1e1c19',
  muted: '#57514a',
  rule: '#c8bead',
  ruleStrong: '#7c7263',
  copper: '#97461f',
  caution: '#a12c2a',
  warning: '#7a5500',
  meets: '#2c5e3f',
  wash: '#f3efe6',
} as const;

export type Glyph = 'pass' | 'fail' | 'not_evaluated';

export interface TextStyle {
  font?: FontKind;
  size?: number;
  color?: string;
}

export interface Cell extends TextStyle {
  text: string;
  glyph?: Glyph;
}

export interface Column {
  header: string;
  /** Width in mm; columns without one share what is left. */
  width?: number;
  align?: 'left' | 'right';
}

/** Text widths depend only on the text, face and size: every sheet shares them. */
const widths = new Map<string, number>();

export class SheetWriter {
  y: number = PAGE.top;
  readonly left = PAGE.left;
  readonly right = PAGE.width - PAGE.right;
  readonly width = PAGE.width - PAGE.left - PAGE.right;

  constructor(
    readonly doc: jsPDF,
    /** Drawn at the top of every page after the first (a running head). */
    private readonly runningHead: (w: SheetWriter) => void = () => {},
  ) {}

  // ---------------------------------------------------------------------------------------------- pages

  newPage(): void {
    this.doc.addPage();
    this.y = PAGE.top;
    this.runningHead(this);
  }

  /** Starts a new page unless `height` mm still fit; true when it did. */
  ensure(height: number): boolean {
    if (this.y + height <= PAGE.height - PAGE.bottom) return false;
    this.newPage();
    return true;
  }

  get remaining(): number {
    return PAGE.height - PAGE.bottom - this.y;
  }

  // ----------------------------------------------------------------------------------------------- text

  lineHeight(size: number): number {
    return size * POINT_MM * 1.28;
  }

  /** Width of text in mm, measured run by run in the faces it will be set in (remembered per process). */
  measure(text: string, font: FontKind = 'sans', size = 9): number {
    const key = `${font}\u0000${size}\u0000${text}`;
    const known = widths.get(key);
    if (known !== undefined) return known;
    const { doc } = this;
    doc.setFontSize(size);
    let w = 0;
    for (const r of runsOf(doc, text, font)) {
      setFace(doc, r.font);
      w += doc.getTextWidth(r.text);
    }
    if (widths.size > 50_000) widths.clear();
    widths.set(key, w);
    return w;
  }

  /** Sets one line at (x, baseline y). */
  text(text: string, x: number, y: number, style: TextStyle & { align?: 'left' | 'right' | 'center' } = {}) {
    const { doc } = this;
    const font = style.font ?? 'sans';
    const size = style.size ?? 9;
    let at = x;
    if (style.align === 'right') at = x - this.measure(text, font, size);
    if (style.align === 'center') at = x - this.measure(text, font, size) / 2;
    doc.setFontSize(size);
    doc.setTextColor(style.color ?? INK.ink);
    for (const r of runsOf(doc, text, font)) {
      setFace(doc, r.font);
      doc.text(r.text, at, y);
      at += doc.getTextWidth(r.text);
    }
  }

  /** Breaks text into lines no wider than `width` (on spaces; a word longer than a line is cut). */
  wrap(text: string, width: number, font: FontKind = 'sans', size = 9): string[] {
    const lines: string[] = [];
    for (const paragraph of text.split('\n')) {
      let line = '';
      for (const word of paragraph.split(/ +/)) {
        const candidate = line ? `${line} ${word}` : word;
        if (this.measure(candidate, font, size) <= width) {
          line = candidate;
          continue;
        }
        if (line) lines.push(line);
        line = word;
        while (this.measure(line, font, size) > width && line.length > 1) {
          let cut = line.length - 1;
          while (cut > 1 && this.measure(line.slice(0, cut), font, size) > width) cut--;
          lines.push(line.slice(0, cut));
          line = line.slice(cut);
        }
      }
      lines.push(line);
    }
    return lines;
  }

  /** A wrapped paragraph at the cursor (page breaks between lines). */
  paragraph(text: string, style: TextStyle & { indent?: number; after?: number; width?: number } = {}): void {
    const size = style.size ?? 9;
    const font = style.font ?? 'sans';
    const x = this.left + (style.indent ?? 0);
    const lh = this.lineHeight(size);
    for (const line of this.wrap(text, style.width ?? this.right - x, font, size)) {
      this.ensure(lh);
      this.y += lh;
      this.text(line, x, this.y - lh * 0.25, { ...style, font, size });
    }
    this.y += style.after ?? 1.5;
  }

  /** A numbered section heading with a rule under it, kept with at least `keep` mm of what follows. */
  heading(n: string, title: string, keep = 30): void {
    this.ensure(12 + keep);
    this.y += 5;
    this.text(n, this.left, this.y + 4.2, { font: 'sans', size: 9, color: INK.muted });
    this.text(title, this.left + 8, this.y + 4.4, { font: 'serifBold', size: 13 });
    this.y += 6.5;
    this.hline(this.y, 0.35, INK.ink);
    this.y += 3;
  }

  /** A small uppercase label above a block. */
  caption(text: string): void {
    this.ensure(10);
    this.y += 3.6;
    this.text(text.toUpperCase(), this.left, this.y, { font: 'sansBold', size: 6.8, color: INK.muted });
    this.y += 1.6;
  }

  // -------------------------------------------------------------------------------------------- drawing

  hline(y: number, weight = 0.1, color: string = INK.rule, x1 = this.left, x2 = this.right): void {
    this.doc.setDrawColor(color);
    this.doc.setLineWidth(weight);
    this.doc.line(x1, y, x2, y);
  }

  /** Pass: a tick; fail: a cross; not evaluated: a question mark in a ring — so the sheet reads in grey. */
  glyph(kind: Glyph, x: number, y: number, size = 3): void {
    const { doc } = this;
    doc.setLineWidth(size * 0.16);
    doc.setLineCap('round');
    doc.setLineJoin('round');
    if (kind === 'pass') {
      doc.setDrawColor(INK.meets);
      doc.lines(
        [
          [size * 0.32, size * 0.34],
          [size * 0.62, -size * 0.76],
        ],
        x + size * 0.04,
        y + size * 0.5,
        [1, 1],
        'S',
        false,
      );
    } else if (kind === 'fail') {
      doc.setDrawColor(INK.caution);
      doc.line(x + size * 0.12, y + size * 0.12, x + size * 0.88, y + size * 0.88);
      doc.line(x + size * 0.88, y + size * 0.12, x + size * 0.12, y + size * 0.88);
    } else {
      doc.setDrawColor(INK.warning);
      doc.setLineWidth(size * 0.09);
      doc.circle(x + size / 2, y + size / 2, size * 0.47, 'S');
      this.text('?', x + size / 2, y + size * 0.82, {
        font: 'sansBold',
        size: size * 2.1,
        color: INK.warning,
        align: 'center',
      });
    }
    doc.setLineCap('butt');
    doc.setLineJoin('miter');
  }

  // --------------------------------------------------------------------------------------------- tables

  /**
   * A ruled table at the cursor; a row that does not fit goes to the next page under a repeated head.
   * Cells wrap within their column.
   */
  table(columns: Column[], rows: (string | Cell)[][], opts: { size?: number; headSize?: number } = {}): void {
    const size = opts.size ?? 8;
    const headSize = opts.headSize ?? 7.2;
    const fixed = columns.reduce((s, c) => s + (c.width ?? 0), 0);
    const flex = columns.filter((c) => c.width === undefined).length;
    const widths = columns.map((c) => c.width ?? Math.max(10, (this.width - fixed) / Math.max(1, flex)));
    const pad = 1.4;
    const lh = this.lineHeight(size);

    const head = () => {
      const lines = columns.map((c, i) => this.wrap(c.header, widths[i]! - 2 * pad, 'sansBold', headSize));
      const h = Math.max(...lines.map((l) => l.length)) * this.lineHeight(headSize) + 2 * pad;
      this.ensure(h + lh + 2 * pad);
      let x = this.left;
      columns.forEach((c, i) => {
        lines[i]!.forEach((line, j) => {
          const by = this.y + pad + (j + 1) * this.lineHeight(headSize) - 0.8;
          if (c.align === 'right')
            this.text(line, x + widths[i]! - pad, by, { font: 'sansBold', size: headSize, align: 'right' });
          else this.text(line, x + pad, by, { font: 'sansBold', size: headSize });
        });
        x += widths[i]!;
      });
      this.y += h;
      this.hline(this.y, 0.35, INK.ink);
    };

    head();
    for (const row of rows) {
      const cells = row.map((c) => (typeof c === 'string' ? { text: c } : c));
      const lines = cells.map((c, i) => {
        const indent = c.glyph ? 4 : 0;
        return this.wrap(c.text, widths[i]! - 2 * pad - indent, c.font ?? 'sans', c.size ?? size);
      });
      const h = Math.max(1, ...lines.map((l) => l.length)) * lh + 2 * pad;
      if (this.ensure(h)) head();
      let x = this.left;
      cells.forEach((c, i) => {
        const col = columns[i]!;
        const indent = c.glyph ? 4 : 0;
        if (c.glyph) this.glyph(c.glyph, x + pad, this.y + pad + 0.4, 2.8);
        lines[i]!.forEach((line, j) => {
          const by = this.y + pad + (j + 1) * lh - 0.9;
          const style = { font: c.font ?? 'sans', size: c.size ?? size, color: c.color };
          if (col.align === 'right')
            this.text(line, x + widths[i]! - pad, by, { ...style, align: 'right' as const });
          else this.text(line, x + pad + indent, by, style);
        });
        x += widths[i]!;
      });
      this.y += h;
      this.hline(this.y, 0.1, INK.rule);
    }
    this.y += 2;
  }

  /** Label / value pairs in `columns` columns (the title block and input summaries). */
  fields(pairs: [string, string][], columns = 2, size = 8.4): void {
    const colWidth = this.width / columns;
    const labelSize = 6.6;
    for (let i = 0; i < pairs.length; i += columns) {
      const group = pairs.slice(i, i + columns);
      const wrapped = group.map(([, v]) => this.wrap(v || '—', colWidth - 4, 'sans', size));
      const h = 3.6 + Math.max(...wrapped.map((w) => w.length)) * this.lineHeight(size) + 1.6;
      this.ensure(h);
      group.forEach(([label], j) => {
        const x = this.left + j * colWidth;
        this.text(label, x + 1, this.y + 3, { font: 'sansBold', size: labelSize, color: INK.muted });
        wrapped[j]!.forEach((line, k) => {
          this.text(line, x + 1, this.y + 3 + (k + 1) * this.lineHeight(size), { size });
        });
      });
      this.y += h;
      this.hline(this.y, 0.1, INK.rule);
    }
  }
}

/** Every page's footer: a rule, two muted lines on the left (how to verify; what this is) and "Page i of n". */
export function pageFooters(w: SheetWriter, lines: readonly [string, string]): void {
  const { doc } = w;
  const pages = doc.getNumberOfPages();
  for (let i = 1; i <= pages; i++) {
    doc.setPage(i);
    const y = PAGE.height - PAGE.bottom + 9;
    w.hline(y - 4, 0.1, INK.rule);
    w.text(lines[0], w.left, y, { size: 6.8, color: INK.muted });
    w.text(lines[1], w.left, y + 3.2, { size: 6.8, color: INK.muted });
    w.text(`Page ${i} of ${pages}`, w.right, y, { font: 'sansBold', size: 7.4, align: 'right' });
  }
}

/** The running head of every page: what the document is (left, serif) and what it is of (right), over a rule. */
export const runningHead =
  (what: string, of: string) =>
  (w: SheetWriter): void => {
    w.text(what, w.left, PAGE.top - 6, { font: 'serifBold', size: 8, color: INK.muted });
    w.text(of, w.right, PAGE.top - 6, { size: 7, color: INK.muted, align: 'right' });
    w.hline(PAGE.top - 4.5, 0.1, INK.rule);
  };

/** A writer on a new A4 document whose every page has the running head `what` (left) and `of` (right). */
export const newSheetWriter = (what: string, of: string) =>
  new SheetWriter(newA4Document(), runningHead(what, of));
