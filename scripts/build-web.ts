/** Builds the web app into dist/ when its sources changed (used by npm test and npm start). */
import { buildWebIfChanged } from './lib/web-build';

try {
  if (!buildWebIfChanged(console.log, undefined, process.argv.includes('--force'))) console.log('Web app is up to date.');
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
}
