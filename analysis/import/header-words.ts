/**
 * The plain-English words a column header may use for each target, with how sure a match on
 * them is. Our own list, in the trade's words (see the product page's "Words we use").
 */
import type { ColumnTarget } from './recipe';

export interface HeaderWord {
  /** Normalised phrase: lower case, words separated by single spaces. */
  phrase: string;
  target: ColumnTarget;
  /** Confidence of an exact match (0..1). */
  confidence: number;
  /** Plain words shown with the suggestion, when the match needs a caution. */
  note?: string;
}

const entries: [ColumnTarget, number, string[], string?][] = [
  ['clubSpeed', 0.95, ['club speed', 'clubhead speed', 'club head speed', 'head speed', 'swing speed', 'club spd', 'club velocity', 'clubspeed']],
  ['ballSpeed', 0.95, ['ball speed', 'ball spd', 'ball velocity', 'ballspeed', 'launch speed']],
  ['smashFactor', 0.95, ['smash factor', 'smash', 'smash ratio', 'efficiency']],
  ['launchAngle', 0.95, ['launch angle', 'vertical launch', 'launch vertical', 'vert launch', 'launch v', 'vla', 'vertical launch angle', 'launch elevation']],
  ['launchAngle', 0.75, ['launch'], 'a bare "launch" is read as the vertical launch angle'],
  ['launchDirection', 0.95, ['launch direction', 'horizontal launch', 'launch horizontal', 'horiz launch', 'launch h', 'hla', 'horizontal launch angle', 'start direction', 'launch dir', 'side angle']],
  ['launchDirection', 0.7, ['direction'], 'a bare "direction" is read as the launch direction'],
  ['spinRate', 0.95, ['spin rate', 'total spin', 'spin total', 'ball spin']],
  ['spinRate', 0.85, ['spin']],
  ['backSpin', 0.95, ['back spin', 'backspin', 'back spin rate']],
  ['sideSpin', 0.95, ['side spin', 'sidespin', 'side spin rate']],
  ['spinAxis', 0.95, ['spin axis', 'axis', 'spin tilt', 'tilt', 'axis tilt', 'spin axis tilt']],
  ['attackAngle', 0.95, ['attack angle', 'angle of attack', 'aoa', 'attack']],
  ['clubPath', 0.95, ['club path', 'swing path', 'path', 'path angle']],
  ['faceAngle', 0.95, ['face angle', 'face to target', 'face']],
  ['faceToPath', 0.95, ['face to path', 'ftp', 'face path']],
  ['dynamicLoft', 0.95, ['dynamic loft', 'delivered loft', 'loft at impact', 'impact loft']],
  ['dynamicLoft', 0.5, ['loft'], 'a bare "loft" may be the head\'s static loft'],
  ['spinLoft', 0.95, ['spin loft']],
  ['carry', 0.95, ['carry', 'carry distance', 'carry dist', 'carry length', 'flat carry']],
  ['total', 0.95, ['total', 'total distance', 'total dist', 'total length']],
  ['total', 0.6, ['distance'], 'a bare "distance" is read as the total'],
  ['offline', 0.95, ['offline', 'carry side', 'carry offline', 'side carry', 'lateral', 'carry lateral', 'deviation', 'carry deviation', 'side distance', 'offline carry', 'off line', 'left right']],
  ['offline', 0.7, ['side'], 'a bare "side" is read as the offline distance'],
  ['apexHeight', 0.95, ['apex', 'apex height', 'peak height', 'max height', 'maximum height', 'height', 'peak']],
  ['descentAngle', 0.95, ['descent angle', 'descent', 'land angle', 'landing angle', 'angle of descent', 'descent angle at landing']],
  ['flightTime', 0.95, ['flight time', 'hang time', 'air time', 'time of flight', 'time in air']],
  ['club', 0.95, ['club', 'club type', 'club name', 'clubs', 'club code', 'club used']],
  ['build', 0.9, ['build', 'shaft', 'head', 'tag', 'setup', 'set up', 'config', 'configuration', 'build name', 'head model', 'shaft model', 'club build', 'variant', 'combo', 'shaft name', 'head name', 'test club', 'label']],
  ['ignore', 0.9, ['shot', 'shot number', 'shot no', 'no', 'nr', 'number', 'index', 'id', 'row', 'date', 'timestamp', 'date time', 'time stamp', 'player', 'name', 'golfer', 'hand', 'handedness', 'notes', 'note', 'comment', 'comments', 'ball', 'ball type', 'mode', 'session', 'target', 'roll', 'run', 'rollout', 'bay', 'venue']],
  ['ignore', 0.85, ['total side', 'total offline', 'total lateral', 'total deviation', 'side total', 'offline total', 'lateral total'], 'offline at rest; Ovalyard keeps the offline at carry'],
  ['ignore', 0.6, ['time'], 'a bare "time" is usually the time of day; map it to flight time if it is'],
];

/** Every header word, exact phrases first. */
export const HEADER_WORDS: readonly HeaderWord[] = entries.flatMap(([target, confidence, phrases, note]) =>
  phrases.map((phrase) => (note ? { phrase, target, confidence, note } : { phrase, target, confidence })),
);
