import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { AppError } from '@/lib/errors';
import { parseWith } from '@/lib/validation';

describe('AppError', () => {
  it('maps the code kind to the HTTP status and serialises code, message and path', () => {
    const e = new AppError('forbidden:memo', 'no', 'title');
    expect(e.status).toBe(403);
    expect(e.toJSON()).toEqual({ error: { code: 'forbidden:memo', message: 'no', path: 'title' } });
    expect(new AppError('invalid:dataset', 'bad').status).toBe(422);
    expect(new AppError('unauthorized:session', 'x').status).toBe(401);
  });

  it('names the first bad field of a zod schema', () => {
    const schema = z.object({ intervals: z.object({ level: z.number().gt(0).lt(1) }) });
    try {
      parseWith(schema, { intervals: { level: 2 } }, 'request');
      expect.unreachable();
    } catch (e) {
      expect((e as AppError).code).toBe('invalid:request');
      expect((e as AppError).path).toBe('intervals.level');
      expect((e as AppError).message).toMatch(/^intervals\.level: /);
    }
  });
});
