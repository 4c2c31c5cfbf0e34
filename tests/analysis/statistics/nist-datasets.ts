// NIST Statistical Reference Datasets, univariate summary statistics
// (https://www.itl.nist.gov/div898/strd/univ/homepage.html). Data and certified values as
// from those pages (NumAcc1, NumAcc3, NumAcc4, Michelso); the Michelso values are copied from the Go package
// montanaflynn/stats, nist_test.go (commit 3b77151e), which reproduces the NIST file.

export const NUM_ACC_1 = { data: [10000001, 10000003, 10000002], mean: 10000002, sd: 1 };

/** The file's values as written (decimal literals), not as sums that round differently. */
function numAcc(first: string, low: string, high: string): number[] {
  const data = [Number(first)];
  for (let i = 0; i < 500; i++) data.push(Number(low), Number(high));
  return data;
}

/** NumAcc2: 1.2, then 500 pairs (1.1, 1.3). */
export const NUM_ACC_2 = { data: numAcc('1.2', '1.1', '1.3'), mean: 1.2, sd: 0.1 };
/** NumAcc3: 1000000.2, then 500 pairs (1000000.1, 1000000.3). */
export const NUM_ACC_3 = { data: numAcc('1000000.2', '1000000.1', '1000000.3'), mean: 1000000.2, sd: 0.1 };

export const MICHELSO = {
  mean: 299.8524,
  sd: 0.0790105478190518,
  data: [
    299.85, 299.74, 299.9, 300.07, 299.93, 299.85, 299.95, 299.98, 299.98, 299.88, 300.0, 299.98,
    299.93, 299.65, 299.76, 299.81, 300.0, 300.0, 299.96, 299.96, 299.96, 299.94, 299.96, 299.94,
    299.88, 299.8, 299.85, 299.88, 299.9, 299.84, 299.83, 299.79, 299.81, 299.88, 299.88, 299.83,
    299.8, 299.79, 299.76, 299.8, 299.88, 299.88, 299.88, 299.86, 299.72, 299.72, 299.62, 299.86,
    299.97, 299.95, 299.88, 299.91, 299.85, 299.87, 299.84, 299.84, 299.85, 299.84, 299.84, 299.84,
    299.89, 299.81, 299.81, 299.82, 299.8, 299.77, 299.76, 299.74, 299.75, 299.76, 299.91, 299.92,
    299.89, 299.86, 299.88, 299.72, 299.84, 299.85, 299.85, 299.78, 299.89, 299.84, 299.78, 299.81,
    299.76, 299.81, 299.79, 299.81, 299.82, 299.85, 299.87, 299.87, 299.81, 299.74, 299.81, 299.94,
    299.95, 299.8, 299.81, 299.87,
  ],
};
