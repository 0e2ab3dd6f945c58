import jStatModule from 'jstat';

/** The parts of jStat 1.9.6 the reference tests use (an outside implementation to check against). */
export interface JStat {
  normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
  ibeta(x: number, a: number, b: number): number;
  gammaln(x: number): number;
  combination(n: number, k: number): number;
  percentile(values: number[], k: number, exclusive?: boolean): number;
  spearmancoeff(a: number[], b: number[]): number;
  corrcoeff(a: number[], b: number[]): number;
  median(values: number[]): number;
  mean(values: number[]): number;
  variance(values: number[], sample?: boolean): number;
  stdev(values: number[], sample?: boolean): number;
  geomean(values: number[]): number;
}

export const jStat = jStatModule as unknown as JStat;
