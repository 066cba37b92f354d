import { escapeHtml } from '../../mail/templates';

/** A tiny stand-alone page (no client bundle, no sign-in) for the unsubscribe link. */
export function unsubscribePage(p: {
  title: string;
  paragraphs: string[];
  form?: { action: string; button: string };
}): string {
  const body = p.paragraphs.map((t) => `<p>${escapeHtml(t)}</p>`).join('');
  const form = p.form
    ? `<form method="post" action="${escapeHtml(p.form.action)}"><button type="submit">${escapeHtml(p.form.button)}</button></form>`
    : '';
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<meta name="robots" content="noindex"><title>${escapeHtml(p.title)} · Shoalwise</title><link rel="icon" href="/favicon.svg">
<style>body{font-family:Nunito,system-ui,sans-serif;background:#fbf9f4;color:#0a2631;margin:0;padding:24px}
main{max-width:480px;margin:10vh auto;background:#fff;border-radius:14px;padding:24px;box-shadow:0 1px 4px #0a263118}
h1{font-size:1.4rem;margin:0 0 12px}p{line-height:1.5}a{color:#18576b;font-weight:700}
button{min-height:48px;padding:0 24px;border:0;border-radius:999px;background:#18576b;color:#fff;font:inherit;font-weight:700;cursor:pointer}</style></head>
<body><main><h1>${escapeHtml(p.title)}</h1>${body}${form}<p><a href="/profile">Choose which e-mails you get</a></p></main></body></html>`;
}
