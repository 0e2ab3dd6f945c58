import * as z from 'zod/mini';
import { cluster } from './cluster';
import { movingBlock } from './moving-block';
import { ordinary } from './ordinary';
import { parametric } from './parametric';
import { residual } from './residual';
import { stationary } from './stationary';
import { stratified } from './stratified';
import type { SchemeDefinition } from './types';

/**
 * Every scheme the engine runs. Adding one: a file exporting a SchemeDefinition, one entry
 * in `list` and in `schemeSchema`, and its name out of PLANNED_SCHEMES.
 */
export const schemeSchema = z.discriminatedUnion('name', [ordinary.schema, stratified.schema, cluster.schema, parametric.schema, residual.schema, movingBlock.schema, stationary.schema] as const);

export type SchemeSettings = z.output<typeof schemeSchema>;

const list = [ordinary, stratified, cluster, parametric, residual, movingBlock, stationary] as SchemeDefinition<{ name: string }>[];

export const SCHEMES: ReadonlyMap<string, SchemeDefinition<{ name: string }>> = new Map(list.map((d) => [d.name, d]));

/** Schemes in the contract that this engine version does not run yet. */
export const PLANNED_SCHEMES: readonly string[] = [];

export function schemeNames(): string[] {
  return list.map((d) => d.name);
}
