export { csvCell, csvLine } from './csv-cell';
export { neutraliseCsv } from './neutralise-csv';
