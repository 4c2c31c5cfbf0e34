/**
 * The spec sheet as a PDF, made on the server with pdfkit (pure JavaScript). A4 or Letter.
 * Helvetica, one of the PDF standard fonts every reader has: nothing to embed, about 15 ms a
 * sheet (embedding the app's Inter took 200–600 ms of the server's thread per sheet).
 */
import PDFDocument from 'pdfkit';
import { figureLines, ladderTextRows, specRows } from '../../analysis/bag';
import type { UnitSystem } from '../../analysis/units';
import type { SpecSheet } from '../schemas';

export type Paper = 'a4' | 'letter';

const FONTS = { regular: 'Helvetica', medium: 'Helvetica-Bold', bold: 'Helvetica-Bold' } as const;

/** Characters the standard fonts' WinAnsi encoding lacks, in plain stand-ins. */
const STAND_INS: Readonly<Record<string, string>> = { '−': '-', '≈': '~', '→': '->', '≤': '<=', '≥': '>=', '½': '1/2', '¼': '1/4', '¾': '3/4' };

/**
 * Text the standard fonts can print: known stand-ins, then anything outside Latin-1 and the
 * WinAnsi punctuation becomes '?'. O(length).
 */
export function pdfText(text: string): string {
  let out = '';
  for (const ch of text) {
    const code = ch.codePointAt(0)!;
    if (STAND_INS[ch]) out += STAND_INS[ch];
    else if (code < 0x100 || '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ'.includes(ch)) out += ch;
    else out += '?';
  }
  return out;
}
// The app's colours (components/theme.ts): ink, muted text, border, caution.
const INK = '#1E3336';
const MUTED = '#5C6B6C';
const BORDER = '#D8D2C4';
const CAUTION = '#8A5A12';
const CAUTION_SOFT = '#F6EBD2';
const MARGIN = 48;

const dateText = (iso: string) => {
  const d = new Date(iso.length === 10 ? `${iso}T12:00:00Z` : iso);
  return d.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
};

/**
 * Renders the sheet: header, each chosen build with every spec and its figures, clubs taken
 * out, the bag's ladder after the change, the notes on the rules and the workshop caution.
 * O(clubs); a few tens of ms.
 */
export function renderSpecSheetPdf(sheet: SpecSheet, options: { units: UnitSystem; paper: Paper }): Promise<Buffer> {
  const doc = new PDFDocument({
    size: options.paper === 'letter' ? 'LETTER' : 'A4',
    margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN },
    bufferPages: true,
    info: { Title: `Spec sheet · ${sheet.playerName} · ${sheet.fittingDate}`, Author: sheet.shopName, Creator: 'Ovalyard' },
  });
  doc.registerFont('regular', FONTS.regular);
  doc.registerFont('medium', FONTS.medium);
  doc.registerFont('bold', FONTS.bold);
  // Every string goes through pdfText (see above) before it reaches the page.
  const rawText = doc.text.bind(doc) as (text: string, ...rest: unknown[]) => typeof doc;
  (doc as unknown as { text: (text: string, ...rest: unknown[]) => typeof doc }).text = (text: string, ...rest: unknown[]) => rawText(pdfText(String(text)), ...rest);
  const rawHeight = doc.heightOfString.bind(doc);
  doc.heightOfString = (text: string, options?: PDFKit.Mixins.TextOptions) => rawHeight(pdfText(text), options);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const left = MARGIN;
  const width = doc.page.width - 2 * MARGIN;
  const bottom = () => doc.page.height - MARGIN;
  const ensure = (height: number) => {
    if (doc.y + height > bottom()) doc.addPage();
  };
  const heading = (title: string) => {
    ensure(60);
    doc.moveDown(0.8).font('bold').fontSize(13).fillColor(INK).text(title, left, doc.y, { width });
    doc.moveTo(left, doc.y + 2).lineTo(left + width, doc.y + 2).lineWidth(0.5).strokeColor(BORDER).stroke();
    doc.moveDown(0.5);
  };

  // Header
  doc.font('bold').fontSize(20).fillColor(INK).text('Spec sheet', left, MARGIN, { width, continued: false });
  doc.font('regular').fontSize(10).fillColor(MUTED).text(sheet.shopName, left, MARGIN + 6, { width, align: 'right' });
  doc.moveDown(0.6);
  const who = [sheet.playerName, sheet.fitterName ? `fitted by ${sheet.fitterName}` : null, dateText(sheet.fittingDate), sheet.venue === 'indoor' ? 'indoor bay' : 'outdoor range'].filter(Boolean).join(' · ');
  doc.font('medium').fontSize(11).fillColor(INK).text(who, left, doc.y, { width });
  const state = sheet.state === 'accepted' && sheet.acceptedAt ? `Accepted by the player on ${dateText(sheet.acceptedAt)}` : sheet.state === 'sent' && sheet.sentAt ? `Sent on ${dateText(sheet.sentAt)}` : 'Draft';
  doc.font('regular').fontSize(9).fillColor(MUTED).text(`${state}. Distances in ${options.units === 'imperial' ? 'yards' : 'metres'}.`, { width });

  // Chosen builds
  heading('Chosen builds');
  if (sheet.choices.length === 0) doc.font('regular').fontSize(10).fillColor(MUTED).text('No build chosen yet.', { width });
  for (const c of sheet.choices) {
    const rows = specRows(c.spec);
    const figures = c.figures ? figureLines(c.figures, options.units) : [];
    ensure(40 + rows.length * 13 + figures.length * 12);
    const change = c.change?.kind === 'replace' ? `replaces the ${c.change.replacedClubLabel.toLowerCase()}` : c.change?.kind === 'add' ? 'new in the bag' : '';
    doc.font('bold').fontSize(11).fillColor(INK).text(`${c.clubLabel} — ${c.buildLabel}`, left, doc.y, { width, continued: Boolean(change) });
    if (change) doc.font('regular').fontSize(9).fillColor(MUTED).text(`   ${change}`);
    doc.moveDown(0.2);
    for (const r of rows) {
      const y = doc.y;
      doc.font('regular').fontSize(9).fillColor(MUTED).text(r.label, left + 8, y, { width: 96 });
      doc.font('regular').fontSize(9.5).fillColor(INK).text(r.value, left + 108, y, { width: width - 108 });
      doc.y = Math.max(doc.y, y + 12);
    }
    if (rows.length === 0) doc.font('regular').fontSize(9).fillColor(MUTED).text('No specs entered.', left + 8, doc.y, { width: width - 8 });
    if (figures.length) {
      doc.moveDown(0.2).font('medium').fontSize(9).fillColor(INK).text('Why this build', left + 8, doc.y, { width: width - 8 });
      for (const f of figures) doc.font('regular').fontSize(9).fillColor(INK).text(`• ${f}`, left + 16, doc.y, { width: width - 16 });
    }
    doc.moveDown(0.6);
  }
  if (sheet.takenOut.length) {
    ensure(30);
    doc.font('medium').fontSize(10).fillColor(INK).text(`Out of the bag: ${sheet.takenOut.join(', ')}.`, left, doc.y, { width });
  }

  // Ladder
  heading('The bag’s ladder after the change');
  const cols = [
    { title: 'Club', w: 0.3 },
    { title: 'Loft', w: 0.09 },
    { title: 'Carry', w: 0.12 },
    { title: 'From', w: 0.17 },
    { title: 'Gap to next', w: 0.17 },
    { title: 'Loft step', w: 0.15 },
  ];
  const row = (cells: string[], font: 'regular' | 'medium', color: string) => {
    ensure(16);
    const y = doc.y;
    let x = left;
    cells.forEach((cell, i) => {
      const w = cols[i].w * width;
      doc.font(font).fontSize(9).fillColor(color).text(cell, x + 2, y, { width: w - 4, lineBreak: false, ellipsis: true });
      x += w;
    });
    doc.y = y + 14;
  };
  row(cols.map((c) => c.title), 'medium', MUTED);
  for (const r of ladderTextRows(sheet.ladder, sheet.ladderLabels, options.units)) {
    row([r.club, r.loft, r.carry, r.from, r.gap, r.loftStep], 'regular', r.flagged ? CAUTION : INK);
  }
  if (sheet.ladder.length === 0) doc.font('regular').fontSize(9).fillColor(MUTED).text('No clubs with a loft or carry yet.', left, doc.y, { width });
  doc.font('regular').fontSize(8).fillColor(MUTED).text('Gaps: about 10–15 yd between irons is usual; under 7 yd is tight, over 20 yd wide (25 yd for woods and hybrids); wedge lofts in 4–6° steps (common practice). “Estimate”: the ball-flight model’s carry for the club’s loft and the player’s speed.', left, doc.y + 4, { width });

  // Notes on the rules
  heading('Notes on the rules');
  if (sheet.checks.length === 0) doc.font('regular').fontSize(9).fillColor(MUTED).text('No notes: the clubs above raise nothing under the length, loft and 14-club rules.', { width });
  for (const check of sheet.checks) {
    ensure(36);
    doc.font('medium').fontSize(9.5).fillColor(check.severity === 'advice' ? INK : CAUTION).text(check.title, left, doc.y, { width });
    doc.font('regular').fontSize(9).fillColor(INK).text(check.text, left, doc.y, { width });
    doc.moveDown(0.3);
  }

  // Workshop caution
  doc.moveDown(0.6);
  doc.font('regular').fontSize(9);
  const boxHeight = doc.heightOfString(sheet.caution, { width: width - 24 }) + 30;
  ensure(boxHeight + 8);
  const top = doc.y;
  doc.rect(left, top, width, boxHeight).fill(CAUTION_SOFT);
  doc.rect(left, top, 3, boxHeight).fill(CAUTION);
  doc.font('bold').fontSize(9.5).fillColor(CAUTION).text('Workshop work', left + 12, top + 8, { width: width - 24 });
  doc.font('regular').fontSize(9).fillColor(INK).text(sheet.caution, left + 12, doc.y + 2, { width: width - 24 });

  // Page numbers
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    doc.page.margins.bottom = 0; // the footer sits in the bottom margin: no page break for it
    doc.font('regular').fontSize(8).fillColor(MUTED).text(`${sheet.playerName} · spec sheet · page ${i + 1} of ${range.count}`, left, doc.page.height - MARGIN + 16, { width, align: 'center', lineBreak: false });
  }
  doc.end();
  return done;
}
