/**
 * The stray rules on invented sessions with known injected mishits: per kind of mishit how many
 * were caught, and how many normal shots were flagged (fixtures/sessions/). Prints the figures
 * for a clear mishit at 6 and at 5 of the group's own normal-shot standard deviations.
 * Run: node --import tsx scripts/stray-validation.ts [--seed N] [--groups PER_CELL]
 */
import { formatValidationFigures, runStrayValidation } from '@/fixtures/sessions/stray-validation';

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(name);
  const value = i === -1 ? fallback : Number(process.argv[i + 1]);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} needs a positive whole number`);
  return value;
}

const seed = option('--seed', 2);
const groupsPerCell = option('--groups', 80);
for (const clearSds of [6, 5]) {
  console.log(`\nSeed ${seed}, ${groupsPerCell} groups per player profile and club; clear = at least ${clearSds} sd of the group's normal shots (and 6% smash or ball speed, 12% carry, 6° launch):`);
  console.log(formatValidationFigures(runStrayValidation({ seed, groupsPerCell, clearSds })));
}
