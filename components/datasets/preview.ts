'use client';

import Papa from 'papaparse';
import type { ColumnType } from '@/db/tables/datasets';
import { ColumnBuilder } from '@/lib/datasets/column-builder';
import { Utf8Reader } from '@/lib/datasets/decode';
import { AppError } from '@/lib/errors';
import type { ReadOptions } from '@/lib/datasets/options';
import { completeLines, guessOptions, SNIFF_CHARS } from '@/lib/datasets/sniff';

export interface Preview {
  options: ReadOptions;
  names: string[];
  types: ColumnType[];
  rows: string[][];
  /** A problem already visible in the first lines (bad encoding, binary, ragged), naming the line. */
  problem: string | null;
}

/** Reads the start of a file (at most 64 KB) for the preview: it never loads the whole file. */
export async function fileSample(file: Blob): Promise<{ bytes: Uint8Array; whole: boolean }> {
  const slice = file.slice(0, SNIFF_CHARS);
  return { bytes: new Uint8Array(await slice.arrayBuffer()), whole: file.size <= SNIFF_CHARS };
}

/**
 * The first rows as the server will read them, with the same guesses (lib/datasets/sniff)
 * and type rules (lib/datasets/column-builder), so what the user corrects here is what they get.
 */
export function previewOf(sample: { bytes: Uint8Array; whole: boolean } | { text: string }, given: Partial<ReadOptions>): Preview {
  let text: string;
  let whole = true;
  let problem: string | null = null;
  if ('text' in sample) text = sample.text;
  else {
    whole = sample.whole;
    try {
      const r = new Utf8Reader();
      text = r.push(sample.bytes) + (whole ? r.end() : '');
    } catch (e) {
      return { options: { delimiter: ',', header: true, decimal: '.', ...given }, names: [], types: [], rows: [], problem: e instanceof AppError ? e.message : String(e) };
    }
  }
  if (!text.trim()) return { options: { delimiter: ',', header: true, decimal: '.', ...given }, names: [], types: [], rows: [], problem: 'The file is empty.' };
  const { newline, ...options } = guessOptions(text, given, whole);
  const parsed = Papa.parse<string[]>(completeLines(text, whole), { delimiter: options.delimiter, newline });
  // Line numbers as the server counts them: blank lines and newlines inside quotes count too.
  const all: string[][] = [];
  const lines: number[] = [];
  let line = 1;
  for (const r of parsed.data) {
    const here = line;
    line += 1 + r.reduce((n, f) => n + (f.match(/\n/g)?.length ?? 0), 0);
    if (r.length === 1 && r[0].trim() === '') continue;
    all.push(r);
    lines.push(here);
  }
  const width = all[0]?.length ?? 0;
  const names = options.header ? all[0].map((n, j) => n.trim() || `column_${j + 1}`) : Array.from({ length: width }, (_, j) => `column_${j + 1}`);
  const body = options.header ? all.slice(1) : all;
  const ragged = body.findIndex((r) => r.length !== width);
  if (ragged >= 0) problem = `Line ${lines[ragged + (options.header ? 1 : 0)]} has ${body[ragged].length} fields, but line ${lines[0]} has ${width}. Check the delimiter.`;
  const builders = names.map((n) => new ColumnBuilder(n, options.decimal));
  for (const r of body) if (r.length === width) r.forEach((f, j) => builders[j].push(f, 0));
  const types = builders.map((b) => b.finish().type);
  return { options, names, types, rows: body.slice(0, 8), problem };
}
