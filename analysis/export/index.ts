export { csvCell, csvLine } from './csv-cell';
