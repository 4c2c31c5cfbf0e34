/**
 * Canonical shot fields: one unit per field (see DEVELOPERS.md, "Canonical data").
 * Speeds m/s, distances m, angles deg, spin rpm, time s.
 * Sign conventions: + is right (offline, launchDirection, clubPath, faceAngle, spinAxis,
 * sideSpin); attackAngle + is upward.
 */
export const SHOT_FIELDS = [
  'clubSpeed',
  'ballSpeed',
  'smashFactor',
  'launchAngle',
  'launchDirection',
  'spinRate',
  'backSpin',
  'sideSpin',
  'spinAxis',
  'attackAngle',
  'clubPath',
  'faceAngle',
  'faceToPath',
  'dynamicLoft',
  'spinLoft',
  'carry',
  'total',
  'offline',
  'apexHeight',
  'descentAngle',
  'flightTime',
] as const;

export type ShotField = (typeof SHOT_FIELDS)[number];

/** The canonical unit of each field. */
export type CanonicalUnit = 'm/s' | 'm' | 'deg' | 'rpm' | 's' | 'ratio';

export const FIELD_UNITS: Readonly<Record<ShotField, CanonicalUnit>> = {
  clubSpeed: 'm/s',
  ballSpeed: 'm/s',
  smashFactor: 'ratio',
  launchAngle: 'deg',
  launchDirection: 'deg',
  spinRate: 'rpm',
  backSpin: 'rpm',
  sideSpin: 'rpm',
  spinAxis: 'deg',
  attackAngle: 'deg',
  clubPath: 'deg',
  faceAngle: 'deg',
  faceToPath: 'deg',
  dynamicLoft: 'deg',
  spinLoft: 'deg',
  carry: 'm',
  total: 'm',
  offline: 'm',
  apexHeight: 'm',
  descentAngle: 'deg',
  flightTime: 's',
};

/** Trade names of the fields, as the UI and messages write them (capitalised). */
export const FIELD_LABELS: Readonly<Record<ShotField, string>> = {
  clubSpeed: 'Club speed',
  ballSpeed: 'Ball speed',
  smashFactor: 'Smash factor',
  launchAngle: 'Launch angle',
  launchDirection: 'Launch direction',
  spinRate: 'Spin rate',
  backSpin: 'Back spin',
  sideSpin: 'Side spin',
  spinAxis: 'Spin axis',
  attackAngle: 'Attack angle',
  clubPath: 'Club path',
  faceAngle: 'Face angle',
  faceToPath: 'Face to path',
  dynamicLoft: 'Dynamic loft',
  spinLoft: 'Spin loft',
  carry: 'Carry',
  total: 'Total',
  offline: 'Offline',
  apexHeight: 'Apex height',
  descentAngle: 'Descent angle',
  flightTime: 'Flight time',
};

/** Fields whose sign means left/right (+ = right). */
export const SIDE_FIELDS: ReadonlySet<ShotField> = new Set<ShotField>([
  'offline',
  'launchDirection',
  'clubPath',
  'faceAngle',
  'spinAxis',
  'sideSpin',
]);

export type ShotValues = Partial<Record<ShotField, number>>;

/** One shot in canonical units. `row` is the 1-based data row number in its bay file. */
export interface Shot {
  row: number;
  /** Canonical club code (DR, 3W, 4H, 7I, PW, W56, PT…) or the name as written when unknown. */
  club: string;
  /** Build label, or null when the file does not say. */
  build: string | null;
  values: ShotValues;
  /** Fields computed rather than read from the file. */
  derived: ShotField[];
}
