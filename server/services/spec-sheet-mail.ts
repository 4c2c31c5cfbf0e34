/** The spec sheet's e-mail: the link to the page, the PDF attached, the workshop caution. */
import { figureLines, specRows } from '../../analysis/bag';
import type { UnitSystem } from '../../analysis/units';
import type { SpecSheet } from '../schemas';
import type { MailMessage } from './mailer';

export function specSheetMessage(
  sheet: SpecSheet,
  options: { to: string; cc: string[]; link: string; pdf: Buffer; fileName: string; units: UnitSystem },
): MailMessage {
  const lines = [
    `Hello ${sheet.playerName},`,
    '',
    `Here is the spec sheet from your fitting at ${sheet.shopName}${sheet.fitterName ? ` with ${sheet.fitterName}` : ''} on ${sheet.fittingDate}.`,
    `Read it and accept it on your phone: ${options.link}`,
    'The PDF is attached for the workshop and your records.',
    '',
  ];
  for (const c of sheet.choices) {
    const change = c.change?.kind === 'replace' ? ` (replaces the ${c.change.replacedClubLabel.toLowerCase()})` : c.change?.kind === 'add' ? ' (new in the bag)' : '';
    lines.push(`${c.clubLabel} — ${c.buildLabel}${change}`);
    for (const r of specRows(c.spec)) lines.push(`  ${r.label}: ${r.value}`);
    for (const f of c.figures ? figureLines(c.figures, options.units) : []) lines.push(`  ${f}`);
    lines.push('');
  }
  if (sheet.takenOut.length) lines.push(`Out of the bag: ${sheet.takenOut.join(', ')}.`, '');
  for (const check of sheet.checks) lines.push(`Note — ${check.title}: ${check.text}`);
  if (sheet.checks.length) lines.push('');
  lines.push(sheet.caution);
  return {
    to: options.to,
    cc: options.cc,
    subject: `Your spec sheet from ${sheet.shopName}`,
    text: lines.join('\n'),
    attachments: [{ filename: options.fileName, content: options.pdf, contentType: 'application/pdf' }],
  };
}
