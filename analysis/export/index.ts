export { csvCell, csvLine } from './csv-cell';
export { exportValue, fieldColumnTitle, shotsCsv } from './shots-csv';
export type { ExportShot } from './shots-csv';
export { groupsCsv } from './groups-csv';
export { neutraliseCsv } from './neutralise-csv';
