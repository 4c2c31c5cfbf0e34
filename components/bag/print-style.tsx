import { useEffect } from 'react';
import { Platform } from 'react-native';

/**
 * The print stylesheet of the print view (web only): the page flows onto as many sheets as it
 * needs (no app scroll box), buttons are left out; backgrounds print only when the reader asks for them. `@page` sets the
 * margins only, so the same page prints on A4 and on US Letter (the document is 700 px wide,
 * inside both: A4 less 2 × 12 mm is 703 px, Letter 725 px at 96 px to the inch).
 */
export const PRINT_CSS = `
@page { margin: 12mm; }
@media print {
  html, body, #root { height: auto !important; overflow: visible !important; display: block !important; background: #fff !important; }
  #root div { overflow: visible !important; }
  [data-print="hide"] { display: none !important; }
  [data-print="keep"] { break-inside: avoid; page-break-inside: avoid; }
}`;

/** Adds the print stylesheet while mounted. */
export function PrintStyle() {
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return undefined;
    const style = document.createElement('style');
    style.id = 'ovalyard-print';
    style.textContent = PRINT_CSS;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
  return null;
}
