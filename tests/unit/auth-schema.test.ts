// Unit: the shared form schemas (used by the browser forms and the routes alike).
import { describe, expect, it } from 'vitest';
import { emailField, newPassword, personName, tokenField } from '@/lib/accounts/schema';
import { labName, roleField } from '@/lib/labs/schema';
import { escapeHtml } from '@/lib/mail/templates/layout';

describe('account and lab schemas', () => {
  it('trims and lower-cases addresses, and refuses malformed or over-long ones', () => {
    expect(emailField.parse('  Ines@Riverside.EXAMPLE ')).toBe('ines@riverside.example');
    for (const bad of ['', 'plain', '@example.org', 'a@', 'a b@example.org', 'a@b', `${'a'.repeat(250)}@ex.org`]) expect(emailField.safeParse(bad).success, bad).toBe(false);
  });

  it('keeps names as typed (SQL, HTML, accents) but refuses control characters and more than 120 characters', () => {
    expect(personName.parse(`  O'Brien <b>&</b> Ñuñez  `)).toBe(`O'Brien <b>&</b> Ñuñez`);
    expect(personName.safeParse('a\u0000b').success).toBe(false);
    expect(personName.safeParse('tab\there').success).toBe(false);
    expect(personName.safeParse('x'.repeat(120)).success).toBe(true);
    expect(personName.safeParse('x'.repeat(121)).success).toBe(false);
    expect(labName.safeParse('').success).toBe(false);
  });

  it('takes passwords of 10 characters up to 72 bytes (bcrypt reads no more than 72 bytes)', () => {
    expect(newPassword.safeParse('123456789').success).toBe(false);
    expect(newPassword.safeParse('1234567890').success).toBe(true);
    expect(newPassword.safeParse('a'.repeat(72)).success).toBe(true);
    expect(newPassword.safeParse('a'.repeat(73)).success).toBe(false);
    // 'é' is 2 bytes in UTF-8: 36 of them are 72 bytes, 37 are 74.
    expect(newPassword.safeParse('é'.repeat(36)).success).toBe(true);
    expect(newPassword.safeParse('é'.repeat(37)).success).toBe(false);
  });

  it('accepts only our token shape and the four roles', () => {
    expect(tokenField.safeParse('A'.repeat(43)).success).toBe(true);
    expect(tokenField.safeParse('A'.repeat(42)).success).toBe(false);
    expect(tokenField.safeParse(`${'A'.repeat(42)}=`).success).toBe(false);
    expect(roleField.options).toEqual(['owner', 'author', 'reviewer', 'reader']);
    expect(roleField.safeParse('admin').success).toBe(false);
  });

  it('escapes the five HTML-significant characters', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });
});
