// Integration: mail through nodemailer over real SMTP to the local fake (smtp-server +
// mailparser) — both parts arrive, the look is Margin's own and carries no tracking; when
// the SMTP server is down, an invitation is not left half-made.
import net from 'node:net';
import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { call, makePerson, useMailCatcher } from './auth-support';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();
const mail = useMailCatcher();

describe('mail delivery', () => {
  it('delivers a plain-text and an HTML part, both with the same link, and captures them in dev_mail', async () => {
    const { sendMail } = await import('@/lib/mail/send');
    const { passwordResetMail } = await import('@/lib/mail/templates/password-reset');
    const to = `parts-${process.pid}@example.org`;
    const url = 'http://127.0.0.1:3000/reset-password?token=' + 'T'.repeat(43);
    await sendMail({ to, ...passwordResetMail({ name: 'Nell', url, expiresAt: new Date('2030-01-01T00:00:00Z') }) });
    const [m] = await mail.to(to);
    expect(m.fromAddress).toContain('Margin');
    expect(m.text).toContain(url);
    expect(m.html).toContain(`href="${url}"`);
    expect(m.text).toContain('Tue, 01 Jan 2030 00:00:00 GMT');
  });

  it('has no tracking: no images, no remote resources, and the only links are the action link', async () => {
    const { invitationMail } = await import('@/lib/mail/templates/invitation');
    const { verifyEmailMail } = await import('@/lib/mail/templates/verify-email');
    const { passwordResetMail } = await import('@/lib/mail/templates/password-reset');
    const url = 'http://127.0.0.1:3000/x?token=abc';
    const when = new Date('2030-01-01T00:00:00Z');
    for (const m of [
      invitationMail({ labName: 'L', inviterName: 'I', role: 'reader', url, expiresAt: when }),
      verifyEmailMail({ name: 'N', url, expiresAt: when }),
      passwordResetMail({ name: 'N', url, expiresAt: when }),
    ]) {
      expect(m.html).not.toMatch(/<img|<script|<link|url\(|@import/i);
      const hrefs = [...m.html.matchAll(/href="([^"]*)"/g)].map((x) => x[1]);
      expect(hrefs).toEqual([url]);
      const textUrls = m.text.match(/https?:\/\/\S+/g);
      expect(textUrls).toEqual([url]);
      expect(m.text.length).toBeGreaterThan(100);
    }
  });

  it('deletes the invitation again when the mail cannot be sent, and says so', async () => {
    // A port that refuses connections: listen, note the port, close.
    const port = await new Promise<number>((resolve) => {
      const s = net.createServer().listen(0, '127.0.0.1', () => {
        const p = (s.address() as net.AddressInfo).port;
        s.close(() => resolve(p));
      });
    });
    const saved = process.env.SMTP_PORT;
    process.env.SMTP_PORT = String(port);
    try {
      const owner = await makePerson('mailless');
      const { createLabFor } = await import('@/lib/labs/labs');
      const { id: labId } = await createLabFor(owner.id, 'Offline lab');
      const route = await import('@/app/api/labs/[labId]/invitations/route');
      const r = await call(session, route.POST, { url: `/api/labs/${labId}/invitations`, method: 'POST', claims: owner.claims, params: { labId: String(labId) }, body: { email: 'x@example.org', role: 'reader' } });
      expect(r.status).toBe(503);
      expect(r.json.error.code).toBe('unavailable:mail');
      const { getPool } = await import('@/db/client');
      const [rows] = (await getPool().query('SELECT COUNT(*) AS n FROM invitations WHERE lab_id = ?', [labId])) as unknown as [{ n: number }[]];
      expect(Number(rows[0].n)).toBe(0);
    } finally {
      process.env.SMTP_PORT = saved;
    }
  });
});
