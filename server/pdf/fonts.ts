import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { jsPDF } from 'jspdf';

/*
 * The sheet's embedded fonts: Source Serif 4 (headings, formulas) and Public Sans (text, tables), the
 * product's own faces, as TTF from the @expo-google-fonts packages (OFL-1.1). jsPDF embeds only the glyphs
 * used (a subset) with a ToUnicode map, so text stays selectable and the file small. Public Sans has no
 * Greek, primes or arrows: a character missing from a face is set in the serif of the same weight, and one
 * missing from both is replaced (see SUBSTITUTES) — jsPDF would otherwise drop it silently.
 */

export type FontKind = 'sans' | 'sansBold' | 'serif' | 'serifBold';

const require = createRequire(import.meta.url);
const FILES: Record<FontKind, { family: string; style: 'normal' | 'bold'; file: string }> = {
  sans: {
    family: 'PublicSans',
    style: 'normal',
    file: '@expo-google-fonts/public-sans/400Regular/PublicSans_400Regular.ttf',
  },
  sansBold: {
    family: 'PublicSans',
    style: 'bold',
    file: '@expo-google-fonts/public-sans/600SemiBold/PublicSans_600SemiBold.ttf',
  },
  serif: {
    family: 'SourceSerif4',
    style: 'normal',
    file: '@expo-google-fonts/source-serif-4/400Regular/SourceSerif4_400Regular.ttf',
  },
  serifBold: {
    family: 'SourceSerif4',
    style: 'bold',
    file: '@expo-google-fonts/source-serif-4/600SemiBold/SourceSerif4_600SemiBold.ttf',
  },
};

const FALLBACK: Record<FontKind, FontKind | null> = {
  sans: 'serif',
  sansBold: 'serifBold',
  serif: null,
  serifBold: null,
};

/** Characters neither face carries, and what is printed instead. */
const SUBSTITUTES: Record<string, string> = {
  '✕': '×',
  '⌀': 'Ø',
  '✗': '×',
  '↻': '→',
  '\u202f': ' ',
  '\u2009': ' ',
  '\u00ad': '',
  '\t': ' ',
};

let binary: Record<FontKind, string> | null = null;
/**
 * The TTF files, read once per process, as binary strings: jsPDF takes a string that starts with the
 * TrueType signature as it is (no base64 decoding per document).
 */
function fontData(): Record<FontKind, string> {
  if (!binary) {
    binary = Object.fromEntries(
      Object.entries(FILES).map(([kind, f]) => [
        kind,
        readFileSync(require.resolve(f.file)).toString('latin1'),
      ]),
    ) as Record<FontKind, string>;
  }
  return binary;
}

/*
 * jsPDF parses every TTF again for every document (about 100 ms for these four faces). The parsed tables
 * never change, so the first parse of each file is kept and every document gets its own thin copy with
 * fresh per-document state — the glyphs used, the ToUnicode map, the widths and the subset — so that a
 * document's output never depends on the documents made before it (the unit test checks the bytes).
 */
type ParsedFont = { subset: { constructor: new (font: unknown) => unknown } } & Record<string, unknown>;
const TTF = (jsPDF as unknown as { API: { TTFFont: { open(file: Uint8Array): ParsedFont } } }).API.TTFFont;
const parsed: { bytes: Uint8Array; font: ParsedFont }[] = [];
const sameBytes = (a: Uint8Array, b: Uint8Array) => a.length === b.length && Buffer.compare(a, b) === 0;
if (!(TTF.open as { cached?: boolean }).cached) {
  const open = TTF.open.bind(TTF);
  const cachedOpen = (file: Uint8Array): ParsedFont => {
    let hit = parsed.find((p) => sameBytes(p.bytes, file));
    if (!hit) {
      hit = { bytes: Uint8Array.from(file), font: open(file) };
      fastDirectoryEncode(hit.font.directory);
      parsed.push(hit);
    }
    // Same prototype and the same own properties (jsPDF tests some with hasOwnProperty), shared tables.
    const copy = Object.assign(Object.create(Object.getPrototypeOf(hit.font)), hit.font) as ParsedFont;
    copy.toUnicode = {};
    copy.Unicode = undefined;
    copy.glyIdsUsed = undefined;
    copy.subset = new hit.font.subset.constructor(copy) as ParsedFont['subset'];
    return copy;
  };
  TTF.open = Object.assign(cachedOpen, { cached: true });
}

/** Sum of the big-endian 32-bit words of `bytes` (zero-padded), as the OpenType table checksum. */
function checksum(bytes: ArrayLike<number>, from = 0, length = bytes.length): number {
  let sum = 0;
  for (let i = 0; i < length; i += 4) {
    const at = from + i;
    const b = (k: number) => (i + k < length ? (bytes[at + k] ?? 0) : 0);
    sum += b(0) * 0x1000000 + ((b(1) << 16) | (b(2) << 8) | b(3));
  }
  return sum & 0xffffffff;
}

/*
 * jsPDF writes the subset font's table directory by concatenating plain arrays of bytes, which costs most
 * of a sheet's time (and garbage). This writes the same bytes — directory, tables padded to 4 bytes,
 * checksums, the head table's checkSumAdjustment — into one typed array.
 */
function fastDirectoryEncode(directory: unknown): void {
  const proto = Object.getPrototypeOf(directory) as { encode: unknown; fast?: boolean; scalarType?: number };
  if (proto.fast) return;
  proto.fast = true;
  proto.encode = function encode(this: { scalarType: number }, tables: Record<string, ArrayLike<number>>) {
    const tags = Object.keys(tables);
    const count = tags.length;
    const searchRange = Math.floor(Math.log(count) / Math.log(2)) * 16;
    const entrySelector = Math.floor(searchRange / Math.log(2));
    const rangeShift = count * 16 - searchRange;
    let size = 12 + count * 16;
    for (const tag of tags) size += Math.ceil(tables[tag]!.length / 4) * 4;
    const out = new Uint8Array(size);
    const view = new DataView(out.buffer);
    view.setUint32(0, this.scalarType >>> 0);
    view.setUint16(4, count & 0xffff);
    view.setUint16(6, searchRange & 0xffff);
    view.setUint16(8, entrySelector & 0xffff);
    view.setUint16(10, rangeShift & 0xffff);
    let entry = 12;
    let offset = 12 + count * 16;
    let headOffset = 0;
    for (const tag of tags) {
      const table = tables[tag]!;
      for (let i = 0; i < 4; i++) out[entry + i] = tag.charCodeAt(i) & 0xff;
      view.setUint32(entry + 4, checksum(table) >>> 0);
      view.setUint32(entry + 8, offset >>> 0);
      view.setUint32(entry + 12, table.length >>> 0);
      entry += 16;
      out.set(table as ArrayLike<number>, offset);
      if (tag === 'head') headOffset = offset;
      offset += Math.ceil(table.length / 4) * 4;
    }
    view.setUint32(headOffset + 8, (0xb1b0afba - checksum(out)) >>> 0);
    return out;
  };
}

/** A new A4 portrait document (millimetres, compressed) with the four faces registered. */
export function newA4Document(): jsPDF {
  const doc = new jsPDF({
    unit: 'mm',
    format: 'a4',
    orientation: 'portrait',
    compress: true,
    putOnlyUsedFonts: true,
  });
  registerFonts(doc);
  return doc;
}

/** Registers the four faces on a new document. */
function registerFonts(doc: jsPDF): void {
  const data = fontData();
  for (const [kind, f] of Object.entries(FILES) as [FontKind, (typeof FILES)[FontKind]][]) {
    const name = `${f.family}-${f.style}.ttf`;
    doc.addFileToVFS(name, data[kind]);
    doc.addFont(name, f.family, f.style, undefined, 'Identity-H');
  }
}

export function setFace(doc: jsPDF, kind: FontKind): void {
  doc.setFont(FILES[kind].family, FILES[kind].style);
}

type Metadata = { characterToGlyph(code: number): number };
/** Coverage per face, shared by every document (the files never change while the process runs). */
const coverage = new Map<FontKind, Map<number, boolean>>();

function covers(doc: jsPDF, kind: FontKind, code: number): boolean {
  let map = coverage.get(kind);
  if (!map) {
    map = new Map();
    coverage.set(kind, map);
  }
  const known = map.get(code);
  if (known !== undefined) return known;
  const f = FILES[kind];
  const font = (
    doc as unknown as { internal: { getFont(n: string, s: string): { metadata?: Metadata } } }
  ).internal.getFont(f.family, f.style);
  const has = (font.metadata?.characterToGlyph(code) ?? 0) !== 0;
  map.set(code, has);
  return has;
}

export interface Run {
  text: string;
  font: FontKind;
}

/** Splits text into runs set in `kind` or its fallback face, substituting what neither carries. */
export function runsOf(doc: jsPDF, text: string, kind: FontKind): Run[] {
  const runs: Run[] = [];
  const push = (ch: string, font: FontKind) => {
    const last = runs[runs.length - 1];
    if (last && last.font === font) last.text += ch;
    else runs.push({ text: ch, font });
  };
  for (const raw of text) {
    const ch = SUBSTITUTES[raw] ?? raw;
    for (const c of ch) {
      const code = c.codePointAt(0)!;
      if (code < 0x20) continue;
      if (covers(doc, kind, code)) push(c, kind);
      else {
        const fb = FALLBACK[kind];
        if (fb && covers(doc, fb, code)) push(c, fb);
        else push('?', kind);
      }
    }
  }
  return runs;
}
