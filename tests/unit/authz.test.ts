import { describe, expect, it } from 'vitest';
import { ACTIONS, can } from '@/lib/authz';

// The role rules of PRODUCT.md: Owner — everything; Author — write memos, data, blocks;
// Reviewer — read + margin notes; Reader — read only.
describe('role → allowed actions', () => {
  it('gives each role a strictly larger set than the one below it', () => {
    const count = (r: 'owner' | 'author' | 'reviewer' | 'reader') => ACTIONS.filter((a) => can(r, a)).length;
    expect(count('reader')).toBeLessThan(count('reviewer'));
    expect(count('reviewer')).toBeLessThan(count('author'));
    expect(count('author')).toBeLessThan(count('owner'));
    expect(count('owner')).toBe(ACTIONS.length);
  });

  it('lets Readers read and nothing else', () => {
    expect(ACTIONS.filter((a) => can('reader', a))).toEqual(['lab:read', 'memo:read', 'dataset:read']);
  });

  it('lets Reviewers comment but not write memos or data', () => {
    expect(can('reviewer', 'memo:comment')).toBe(true);
    expect(can('reviewer', 'memo:write')).toBe(false);
    expect(can('reviewer', 'dataset:write')).toBe(false);
  });

  it('keeps member management and reading links to Owners', () => {
    for (const r of ['author', 'reviewer', 'reader'] as const) {
      expect(can(r, 'lab:manage-members')).toBe(false);
      expect(can(r, 'link:manage')).toBe(false);
    }
    expect(can('owner', 'lab:manage-members')).toBe(true);
  });

  it('refuses everything to a non-member', () => {
    expect(ACTIONS.some((a) => can(null, a))).toBe(false);
  });
});
