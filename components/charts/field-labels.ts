import type { ShotField } from '@/analysis/fields';

/** Trade names of the shot fields, as the charts write them. */
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
