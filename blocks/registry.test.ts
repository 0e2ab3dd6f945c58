// The two registries list the same block types, and every client entry file is marked
// 'use client' as its first statement (Next.js requires it to bundle node views).
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { SERVER_BLOCKS } from './registry.server';

describe('block registries', () => {
  it('lists the same types on both sides, each with a view file', () => {
    const client = readFileSync(path.join(__dirname, 'registry.client.ts'), 'utf8');
    const types = SERVER_BLOCKS.map((b) => b.definition.type);
    expect(types).toEqual(['data-table', 'estimate', 'resample-histogram', 'convergence-plot', 'group-comparison']);
    for (const t of types) {
      expect(client).toMatch(new RegExp(`from './${t}/view'`));
      expect(readdirSync(path.join(__dirname, t))).toEqual(expect.arrayContaining(['schema.ts', 'index.ts', 'view.tsx']));
    }
    const computing = SERVER_BLOCKS.filter((b) => b.compute).map((b) => b.definition.type);
    expect(computing).toEqual(['estimate', 'resample-histogram', 'convergence-plot', 'group-comparison']);
  });

  it("starts every view and client registry with 'use client'", () => {
    const files = [path.join(__dirname, 'registry.client.ts'), ...readdirSync(__dirname).flatMap((d) => (d.includes('.') ? [] : readdirSync(path.join(__dirname, d)).filter((f) => f === 'view.tsx').map((f) => path.join(__dirname, d, f))))];
    expect(files.length).toBeGreaterThanOrEqual(7);
    for (const f of files) expect(readFileSync(f, 'utf8').trimStart().startsWith("'use client';"), f).toBe(true);
  });

  it("marks every compute file server-only", () => {
    for (const d of readdirSync(__dirname).filter((x) => !x.includes('.'))) {
      const f = path.join(__dirname, d, 'compute.ts');
      try {
        expect(readFileSync(f, 'utf8').startsWith("import 'server-only';"), f).toBe(true);
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
      }
    }
  });
});
