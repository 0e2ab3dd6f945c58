import * as z from 'zod';
import { ordinary } from './ordinary';
import { stratified } from './stratified';
import type { SchemeDefinition } from './types';

/**
 * Every scheme the engine runs. Adding one: a file exporting a SchemeDefinition, one entry
 * in `list` and in `schemeSchema`, and its name out of PLANNED_SCHEMES.
 */
export const schemeSchema = z.discriminatedUnion('name', [ordinary.schema, stratified.schema] as const);

export type SchemeSettings = z.output<typeof schemeSchema>;

const list = [ordinary, stratified] as SchemeDefinition<{ name: string }>[];

export const SCHEMES: ReadonlyMap<string, SchemeDefinition<{ name: string }>> = new Map(list.map((d) => [d.name, d]));

/** Schemes in the contract that this engine version does not run yet. */
export const PLANNED_SCHEMES: readonly string[] = ['cluster', 'parametric', 'residual', 'moving-block', 'stationary'];

export function schemeNames(): string[] {
  return list.map((d) => d.name);
}
