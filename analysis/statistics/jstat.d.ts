// jstat ships no type declarations; this types only the part of its API that analysis/ uses
// (jstat 1.9.6, https://jstat.github.io/distributions.html).
declare module 'jstat' {
  interface JStatDistributions {
    studentt: {
      cdf(x: number, dof: number): number;
      inv(p: number, dof: number): number;
    };
    centralF: {
      cdf(x: number, df1: number, df2: number): number;
      inv(p: number, df1: number, df2: number): number;
    };
    chisquare: {
      cdf(x: number, dof: number): number;
      inv(p: number, dof: number): number;
    };
    normal: {
      cdf(x: number, mean: number, sd: number): number;
      inv(p: number, mean: number, sd: number): number;
    };
  }
  export const jStat: JStatDistributions;
}
