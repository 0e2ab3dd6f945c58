import * as z from 'zod/mini';
import { correlation } from './correlation';
import { cv } from './cv';
import { geometricMean } from './geometric-mean';
import { iqr } from './iqr';
import { mad } from './mad';
import { mean } from './mean';
import { meanDifference } from './mean-difference';
import { median } from './median';
import { medianDifference } from './median-difference';
import { quantile } from './quantile';
import { ratioOfMeans } from './ratio-of-means';
import { regressionIntercept } from './regression-intercept';
import { regressionSlope } from './regression-slope';
import { sd } from './sd';
import { trimmedMean } from './trimmed-mean';
import type { StatisticDefinition } from './types';
import { variance } from './variance';

/**
 * Every statistic the engine knows. Adding one: a file exporting a StatisticDefinition
 * and one entry here (and in `statisticSchema` below).
 */
export const statisticSchema = z.discriminatedUnion('name', [
  mean.schema,
  median.schema,
  trimmedMean.schema,
  quantile.schema,
  variance.schema,
  sd.schema,
  mad.schema,
  iqr.schema,
  geometricMean.schema,
  cv.schema,
  correlation.schema,
  ratioOfMeans.schema,
  meanDifference.schema,
  medianDifference.schema,
  regressionSlope.schema,
  regressionIntercept.schema,
] as const);

export type StatisticSettings = z.output<typeof statisticSchema>;
export type StatisticName = StatisticSettings['name'];

const list = [
  mean,
  median,
  trimmedMean,
  quantile,
  variance,
  sd,
  mad,
  iqr,
  geometricMean,
  cv,
  correlation,
  ratioOfMeans,
  meanDifference,
  medianDifference,
  regressionSlope,
  regressionIntercept,
] as StatisticDefinition<{ name: string }>[];

export const STATISTICS: ReadonlyMap<string, StatisticDefinition<{ name: string }>> = new Map(list.map((d) => [d.name, d]));

export function statisticNames(): string[] {
  return list.map((d) => d.name);
}
