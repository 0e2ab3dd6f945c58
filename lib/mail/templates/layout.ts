/**
 * Margin's own mail look: warm paper, a thin oxide rule down the left, a serif heading and
 * one plain link button. No images, no remote resources, no tracking pixels or redirected
 * links: the link in the mail is the link itself. Every value is escaped, so a lab called
 * `<b>Lab</b>` arrives as that text.
 */
export function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

export interface MailParts {
  subject: string;
  text: string;
  html: string;
}

export interface LayoutInput {
  subject: string;
  heading: string;
  /** Paragraphs of plain text (escaped for the HTML part). */
  paragraphs: string[];
  action: { label: string; url: string };
  /** Small print under the button, e.g. when the link expires. */
  footnote: string;
}

export function renderMail(input: LayoutInput): MailParts {
  const text = [input.heading, '', ...input.paragraphs.flatMap((p) => [p, '']), `${input.action.label}:`, input.action.url, '', input.footnote, '', '— Margin'].join('\n');
  const p = (s: string) => `<p style="margin:0 0 14px 0;font-size:15px;line-height:1.55;color:#23272b">${escapeHtml(s)}</p>`;
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(input.subject)}</title></head>
<body style="margin:0;padding:0;background:#f6f2ea">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:#f6f2ea"><tr><td style="padding:32px 16px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" align="center" style="max-width:560px;width:100%;background:#fffdf8;border:1px solid #d9cfbf;border-left:3px solid #a8452a">
<tr><td style="padding:28px 32px;font-family:'IBM Plex Sans',Helvetica,Arial,sans-serif">
<p style="margin:0 0 20px 0;font-family:'Source Serif 4',Georgia,serif;font-size:18px;font-weight:600;color:#23272b">Margin</p>
<h1 style="margin:0 0 16px 0;font-family:'Source Serif 4',Georgia,serif;font-size:22px;line-height:1.3;font-weight:600;color:#23272b">${escapeHtml(input.heading)}</h1>
${input.paragraphs.map(p).join('\n')}
<p style="margin:22px 0"><a href="${escapeHtml(input.action.url)}" style="display:inline-block;background:#23272b;color:#f6f2ea;text-decoration:none;padding:10px 18px;border-radius:6px;font-size:15px;font-weight:500">${escapeHtml(input.action.label)}</a></p>
<p style="margin:0 0 8px 0;font-size:13px;line-height:1.5;color:#7b8288">If the button does not work, paste this address into your browser:<br><span style="word-break:break-all;color:#2f5d73">${escapeHtml(input.action.url)}</span></p>
<p style="margin:16px 0 0 0;font-size:13px;line-height:1.5;color:#7b8288">${escapeHtml(input.footnote)}</p>
</td></tr></table>
</td></tr></table>
</body></html>`;
  return { subject: input.subject, text, html };
}
