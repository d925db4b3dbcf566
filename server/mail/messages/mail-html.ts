/** HTML that is already escaped; only the helpers in this file make it. */
export type SafeHtml = string & { readonly __safeHtml: true };

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML element content and quoted attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ENTITIES[c]!);
}

const safe = (html: string) => html as SafeHtml;
const INK = '#1f2a2e';
const MUTED = '#5b6468';
const RULE = '#e2ddd2';

/** A paragraph of text. */
export function paragraph(text: string): SafeHtml {
  return safe(`<p style="margin:0 0 16px 0;">${escapeHtml(text)}</p>`);
}

/** A small heading above a section. */
export function heading(text: string): SafeHtml {
  return safe(`<h2 style="margin:24px 0 8px 0;font-size:18px;color:${INK};">${escapeHtml(text)}</h2>`);
}

/** Lines kept together, e.g. an address. */
export function lines(texts: readonly string[]): SafeHtml {
  return safe(`<p style="margin:0 0 16px 0;">${texts.filter(Boolean).map(escapeHtml).join('<br>')}</p>`);
}

/** A table with a header row; numeric columns (by index) are right-aligned. */
export function dataTable(head: readonly string[], rows: readonly (readonly string[])[], numeric: readonly number[] = []): SafeHtml {
  const cell = (tag: 'th' | 'td', text: string, i: number) =>
    `<${tag} style="padding:8px 10px;border-bottom:1px solid ${RULE};text-align:${numeric.includes(i) ? 'right' : 'left'};${tag === 'th' ? `font-size:14px;color:${MUTED};` : ''}">${escapeHtml(text)}</${tag}>`;
  const header = `<tr>${head.map((h, i) => cell('th', h, i)).join('')}</tr>`;
  const body = rows.map((row) => `<tr>${row.map((c, i) => cell('td', c, i)).join('')}</tr>`).join('');
  return safe(`<table role="presentation" cellpadding="0" cellspacing="0" style="width:100%;border-collapse:collapse;margin:0 0 16px 0;font-size:16px;">${header}${body}</table>`);
}

/**
 * A whole message page: a simple centred table layout with inline styles only (mail programs drop
 * style sheets), the shop's name on top, no images and no scripts.
 */
export function mailPage(shopName: string, title: string, blocks: readonly SafeHtml[], footer: string): string {
  return [
    '<!doctype html>',
    `<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)}</title></head>`,
    '<body style="margin:0;padding:0;background:#f3f0e8;">',
    '<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:#f3f0e8;"><tr><td align="center" style="padding:24px 12px;">',
    `<table role="presentation" width="600" cellpadding="0" cellspacing="0" style="width:100%;max-width:600px;background:#ffffff;border:1px solid ${RULE};font-family:Arial,Helvetica,sans-serif;font-size:16px;line-height:1.5;color:${INK};">`,
    `<tr><td style="background:#26463f;color:#ffffff;padding:16px 24px;font-size:20px;font-weight:bold;">${escapeHtml(shopName)}</td></tr>`,
    `<tr><td style="padding:24px;">${blocks.join('')}</td></tr>`,
    `<tr><td style="padding:16px 24px;border-top:1px solid ${RULE};font-size:13px;color:${MUTED};">${escapeHtml(footer)}</td></tr>`,
    '</table></td></tr></table></body></html>',
  ].join('\n');
}
