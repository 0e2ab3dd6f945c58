import type { Node } from '@tiptap/core';
import type { TopLevelSpec } from 'vega-lite';
import type { z } from 'zod';

/** A block node as found in a memo document. */
export interface DocBlock {
  type: string;
  attrs: Record<string, unknown>;
}
export type FindBlock = (blockId: string) => DocBlock | undefined;

/** What the insert menu knows when it makes a new block. */
export interface InsertContext {
  /** The lab's datasets, newest first (the first is offered by default). */
  datasets: { id: number; name: string; columns: { name: string; type: string; values?: string[] }[] }[];
  /** The Estimate blocks already in the memo (for blocks that show an Estimate's replicates). */
  estimates: { blockId: string; label: string }[];
}

/** One number (or interval) a Live value can show. `se` guides the number of digits. */
export type LiveNumber =
  | { kind: 'number'; value: number; se?: number | null }
  | { kind: 'interval'; lower: number; upper: number; se?: number | null; label?: string };

export type RunSettingsResult<S> = { ok: true; settings: S } | { ok: false; reason: string };

/**
 * The pure half of a block type, shared by server and client: its node, its attribute
 * schema, how a new one starts, which settings its run is keyed on, and which outputs a
 * Live value may show. The server half (compute) is in the block's compute.ts, the
 * client half (node view) in its view.tsx; registries list both.
 */
export interface BlockDefinition<A = Record<string, unknown>, S = unknown, O = unknown> {
  type: string;
  label: string;
  summary: string;
  node: Node;
  /** Node attributes minus blockId; the server re-validates saved documents with this. */
  attrs: z.ZodType<A>;
  newAttrs(ctx: InsertContext): A;
  /** Blocks that compute: the settings a run is keyed on (null-free, validated). */
  settings?: z.ZodType<S>;
  runSettings?(attrs: A, find: FindBlock): RunSettingsResult<S>;
  /** Outputs a Live value may point at: static, from the attributes alone. */
  outputs?(attrs: A): { key: string; label: string }[];
  pick?(output: O, key: string): LiveNumber | null;
  /** The block's figure as a Vega-Lite spec (drawn in the browser, exported as SVG by the server). */
  chart?(output: O, attrs: A): TopLevelSpec;
}

/** Describes a zod failure in one sentence naming the field, for a block's inline message. */
export function firstIssue(error: z.ZodError): string {
  const i = error.issues[0];
  if (!i) return 'invalid settings';
  const path = i.path.map(String).join('.');
  return path ? `${path}: ${i.message}` : i.message;
}
