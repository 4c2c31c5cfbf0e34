/** A build's flight in the words of the player's hand, for the ovals' legend. Pure. */
import type { GroupAnalysis } from '@/analysis/session';
import { curveWord, faceWord, missWord, pathWord, type Hand } from '@/analysis/plain-words/handed-words';

/**
 * " Path: in-to-out; face: open; curves: draw; finishes: miss right (left-handed words)." for a
 * build's mean club path, face angle, spin axis and offline, in the player's hand's words.
 */
export function flightWords(g: Pick<GroupAnalysis, 'fields'>, hand: Hand): string {
  const path = g.fields.clubPath?.mean;
  const face = g.fields.faceAngle?.mean;
  const axis = g.fields.spinAxis?.mean;
  const offline = g.fields.offline?.mean;
  const parts = [
    path === undefined ? null : `path: ${pathWord(path, hand)}`,
    face === undefined ? null : `face: ${faceWord(face, hand)}`,
    axis === undefined ? null : `curves: ${curveWord(axis, hand)}`,
    offline === undefined ? null : `finishes: ${missWord(offline)}`,
  ].filter(Boolean);
  if (parts.length === 0) return '';
  const text = parts.join('; ');
  // it follows a sentence: a capital first
  return ` ${text[0].toUpperCase()}${text.slice(1)} (${hand}-handed words).`;
}

