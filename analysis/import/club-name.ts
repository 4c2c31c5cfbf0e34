/**
 * Club names as files write them ("Driver", "7i", "I7", "Iron 7", "3 Wood", "4H", "Pitching
 * Wedge", "56°") to the canonical codes of analysis/clubs.ts.
 */
import { clubInfo } from '@/analysis/clubs';

const WORDS: Record<string, string> = {
  driver: 'DR', dr: 'DR', drv: 'DR', d: 'DR', '1w': 'DR', w1: 'DR', '1 wood': 'DR', 'wood 1': 'DR',
  putter: 'PT', pt: 'PT', putt: 'PT', ptr: 'PT',
  pw: 'PW', p: 'PW', pitching: 'PW', 'pitching wedge': 'PW', 'pitch wedge': 'PW', 'p wedge': 'PW', pwedge: 'PW',
  gw: 'GW', g: 'GW', gap: 'GW', 'gap wedge': 'GW', 'g wedge': 'GW', aw: 'GW', a: 'GW',
  'approach wedge': 'GW', approach: 'GW', uw: 'GW', 'utility wedge': 'GW',
  sw: 'SW', s: 'SW', sand: 'SW', 'sand wedge': 'SW', 's wedge': 'SW',
  lw: 'LW', l: 'LW', lob: 'LW', 'lob wedge': 'LW', 'l wedge': 'LW',
};

const KIND_WORDS: Record<string, 'W' | 'H' | 'I'> = {
  w: 'W', wd: 'W', wood: 'W', woods: 'W', fw: 'W', fairway: 'W', 'fairway wood': 'W', metal: 'W',
  h: 'H', hy: 'H', hyb: 'H', hybrid: 'H', rescue: 'H',
  i: 'I', ir: 'I', iron: 'I', irons: 'I',
};

const NUMBER_THEN_KIND = /^(\d)\s*(w|wd|wood|fw|fairway|fairway wood|metal|h|hy|hyb|hybrid|rescue|i|ir|iron)$/;
const KIND_THEN_NUMBER = /^(w|wd|wood|fw|fairway|hy|hyb|hybrid|rescue|h|i|ir|iron)\s*(\d)$/;
const LOFT_WEDGE = /^(?:(?:wedge|w|lw|sw|gw)\s*(\d\d(?:\.\d)?)\s*(?:°|deg|degrees?)?|(\d\d(?:\.\d)?)\s*(?:°|deg|degrees?)\s*(?:wedge|w)?|(\d\d(?:\.\d)?)\s*(?:wedge|w))$/;

function normalise(name: string): string {
  return name
    .trim()
    .toLowerCase()
    .replace(/[º˚]/g, '°')
    .replace(/[#_]/g, ' ')
    .replace(/\bno\.?\s*(?=\d)/g, '')
    .replace(/-/g, ' ')
    .replace(/(?<!\d)\.|\.(?!\d)/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}

/**
 * The canonical club code for a club name as written. Unknown names are kept as written
 * (trimmed) with known = false, so the caller can report them. O(name length).
 * A wedge known only by loft (46°–64°, whole degrees) becomes W46–W64; a fractional loft
 * ("56.5°") is not rounded: it is kept as written and reported.
 * @example parseClubName('7 Iron') // => { code: '7I', known: true }
 * @example parseClubName('Wedge 56') // => { code: 'W56', known: true }
 * @example parseClubName('Chipper') // => { code: 'Chipper', known: false }
 */
export function parseClubName(name: string): { code: string; known: boolean } {
  const asWritten = name.trim();
  if (asWritten === '') return { code: '', known: false };
  if (clubInfo(asWritten.toUpperCase()) && /^[A-Za-z0-9]+$/.test(asWritten)) {
    const upper = asWritten.toUpperCase();
    // a bare canonical code; but "1W" means the driver, and "W5" is not "5W"'s spelling of W56
    if (upper !== '1W') return { code: upper, known: true };
  }
  const t = normalise(asWritten);
  const word = WORDS[t];
  if (word) return { code: word, known: true };
  if (/^[1-9]$/.test(t)) return known(`${t}I`, asWritten);
  let m = NUMBER_THEN_KIND.exec(t) ?? KIND_THEN_NUMBER.exec(t);
  if (m) {
    const digit = /\d/.test(m[1]) ? m[1] : m[2];
    const kindWord = /\d/.test(m[1]) ? m[2] : m[1];
    const kind = KIND_WORDS[kindWord];
    if (kind === 'W' && digit === '1') return { code: 'DR', known: true };
    return known(`${digit}${kind}`, asWritten);
  }
  m = LOFT_WEDGE.exec(t);
  if (m) {
    const loft = m[1] ?? m[2] ?? m[3];
    if (!loft.includes('.')) return known(`W${loft}`, asWritten);
  }
  return { code: asWritten, known: false };
}

function known(code: string, asWritten: string): { code: string; known: boolean } {
  return clubInfo(code) ? { code, known: true } : { code: asWritten, known: false };
}
