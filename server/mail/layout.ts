/** Escapes text for HTML: names and team names are user input and must never become markup. */
export function escapeHtml(text: string): string {
  return text
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}

export interface MailContent {
  subject: string;
  /** Plain paragraphs, user values already inserted (they are escaped for the HTML part here). */
  paragraphs: string[];
  action: { label: string; url: string };
  closing: string;
}

/**
 * Renders both parts of a message from the same words. The HTML has inline styles only: no remote
 * images, no tracking pixels, no rewritten links.
 */
export function renderMail({ paragraphs, action, closing }: MailContent): { text: string; html: string } {
  const text = [...paragraphs, `${action.label}:\n${action.url}`, closing, '— Seamwright'].join('\n\n');
  const p = (s: string) => `<p style="margin:0 0 16px">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html><body style="font-family:sans-serif;font-size:16px;line-height:1.5;color:#1f2a30">',
    ...paragraphs.map(p),
    `<p style="margin:24px 0"><a href="${escapeHtml(action.url)}" style="background:#a8471f;color:#fff;` +
      `padding:10px 18px;border-radius:6px;text-decoration:none">${escapeHtml(action.label)}</a></p>`,
    p(`If the button does not work, paste this address into your browser: ${action.url}`),
    p(closing),
    p('— Seamwright'),
    '</body></html>',
  ].join('\n');
  return { text, html };
}
