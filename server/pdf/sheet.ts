import type { jsPDF } from 'jspdf';
import { drawComputedBridges } from './bridges';
import { drawCheckList } from './checks';
import { drawCautions, drawStampAndVerification } from './closing';
import { formatter, sheetDate, VERDICT_WORDS } from './format';
import { drawLayers, drawSite } from './inputs';
import { newSheetWriter, pageFooters, type SheetWriter } from './layout';
import { drawResults } from './results';
import { drawSectionSketch } from './section-sketch';
import type { SheetData } from './sheet-data';
import { drawSweepAppendix } from './sweep-appendix';
import { drawTitleBlock, PRODUCT } from './title-block';

export type { SheetData } from './sheet-data';

/*
 * The compliance sheet of one stored check run, as a PDF: title block and verdict, inputs, the section
 * drawn to scale, every module's results with their formulas and charts, the check list, cautions, a box
 * for the professional's stamp, and "page x of y" with the verification code on every page. Everything is
 * read from the stored run; nothing is recomputed. Same run, same units → the same bytes.
 */

function footers(w: SheetWriter, data: SheetData): void {
  pageFooters(w, [
    `Verify: ${data.verifyUrl}`,
    `${data.run.inputs.project.name} · run ${sheetDate(data.run.createdAt)} · ${VERDICT_WORDS[data.run.verdict].word}`,
  ]);
}

/** PDF metadata: document information and an XMP packet (PDF/A-friendly; the language is set too). */
function metadata(doc: jsPDF, data: SheetData): void {
  const { run } = data;
  const title = `Compliance sheet — ${run.assemblyName} (revision ${run.assemblyRevision})`;
  const subject = `Check of ${run.assemblyName} for ${run.inputs.project.name} against ${run.criteriaSetName}, version ${run.criteriaSetVersion}: ${VERDICT_WORDS[run.verdict].word}`;
  const keywords = [
    'compliance sheet',
    'metal panel wall',
    'effective R-value',
    'condensation',
    'wind attachment',
    'sealant joints',
    `verification ${data.code}`,
  ].join(', ');
  const creator = `${PRODUCT} ${run.engineVersion}`;
  doc.setProperties({ title, subject, author: data.preparedBy ?? data.issuer.name, creator, keywords });
  doc.setLanguage('en-GB');
  doc.setCreationDate(new Date(run.createdAt));
  doc.setFileId(run.hash.slice(0, 32).toUpperCase());
  const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
  const created = new Date(run.createdAt).toISOString();
  doc.addMetadata(
    `<?xpacket begin="\u{feff}" id="W5M0MpCehiHzreSzNTczkc9d"?><x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"><rdf:Description rdf:about="" xmlns:dc="http://purl.org/dc/elements/1.1/" xmlns:xmp="http://ns.adobe.com/xap/1.0/" xmlns:pdf="http://ns.adobe.com/pdf/1.3/"><dc:format>application/pdf</dc:format><dc:title><rdf:Alt><rdf:li xml:lang="x-default">${esc(title)}</rdf:li></rdf:Alt></dc:title><dc:description><rdf:Alt><rdf:li xml:lang="x-default">${esc(subject)}</rdf:li></rdf:Alt></dc:description><dc:creator><rdf:Seq><rdf:li>${esc(data.preparedBy ?? data.issuer.name)}</rdf:li></rdf:Seq></dc:creator><dc:language><rdf:Bag><rdf:li>en-GB</rdf:li></rdf:Bag></dc:language><pdf:Keywords>${esc(keywords)}</pdf:Keywords><pdf:Producer>jsPDF</pdf:Producer><xmp:CreatorTool>${esc(creator)}</xmp:CreatorTool><xmp:CreateDate>${created}</xmp:CreateDate><xmp:ModifyDate>${created}</xmp:ModifyDate></rdf:Description></rdf:RDF></x:xmpmeta><?xpacket end="r"?>`,
    true,
  );
}

/** Renders the sheet; returns the PDF bytes. */
export function renderComplianceSheet(data: SheetData): Buffer {
  const w = newSheetWriter(
    `${PRODUCT} · Compliance sheet`,
    `${data.run.assemblyName}, revision ${data.run.assemblyRevision}`,
  );
  const { doc } = w;
  const fmt = formatter(data.units);

  drawTitleBlock(w, data, fmt);
  w.heading('1', 'Inputs', 40);
  drawLayers(w, data, fmt);
  drawSite(w, data, fmt);
  w.heading('2', 'Section, to scale', 80);
  drawSectionSketch(w, data, fmt);
  drawComputedBridges(w, data, fmt);
  drawResults(w, data, fmt);
  drawCheckList(w, data, fmt);
  drawCautions(w, data);
  drawStampAndVerification(w, data);
  if (data.sweep) drawSweepAppendix(w, data.sweep, fmt);
  footers(w, data);
  metadata(doc, data);
  return Buffer.from(doc.output('arraybuffer'));
}
