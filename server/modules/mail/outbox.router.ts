import { Router } from 'express';
import type { Deps } from '@server/deps';
import { capturedMails } from './captured-mail.queries';

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
const linkify = (escaped: string) => escaped.replace(/https?:\/\/[^\s<]+/g, (u) => `<a href="${u}">${u}</a>`);

/** Development-only: what the fake SMTP server caught. Never mounted in production. */
export function outboxRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const m = deps.dataSource.manager;
  const router = Router();

  router.get('/api/dev/outbox', async (_req, res) => {
    const mails = await capturedMails(m, 200);
    res.json({ mails });
  });

  router.get('/dev/outbox', async (_req, res) => {
    const mails = await capturedMails(m, 100);
    const items = mails
      .map(
        (m) => `<article><h2>${escapeHtml(m.subject)}</h2>
<p class="meta">To ${escapeHtml(m.toAddress)} · from ${escapeHtml(m.fromAddress)} · ${m.receivedAt.toISOString()}</p>
<details open><summary>Text part</summary><pre>${linkify(escapeHtml(m.text))}</pre></details>
<details><summary>HTML part</summary><iframe sandbox title="HTML part of ${escapeHtml(m.subject)}" srcdoc="${escapeHtml(m.html)}"></iframe></details>
${m.attachments.map((a) => `<details><summary>Attachment ${escapeHtml(a.filename)} (${escapeHtml(a.contentType)})</summary><pre>${escapeHtml(a.content)}</pre></details>`).join('')}
</article>`,
      )
      .join('');
    res.type('html')
      .send(`<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Outbox · Shoalwise (development)</title><link rel="icon" href="/favicon.svg">
<style>body{font-family:Nunito,system-ui,sans-serif;background:#fbf9f4;color:#0a2631;max-width:860px;margin:auto;padding:16px}
article{background:#fff;border-radius:14px;padding:16px;margin:12px 0;box-shadow:0 1px 4px #0a263118}h2{margin:0 0 4px;font-size:1.1rem}
.meta{color:#1a6c84;font-size:.85rem;margin:0 0 8px}pre{white-space:pre-wrap;word-break:break-word}iframe{width:100%;height:420px;border:1px solid #d4eef3;border-radius:8px}</style></head>
<body><h1>Outbox</h1><p>E-mails the development mail server caught (${mails.length}). This page does not exist in production.</p>${items || '<p>No e-mails yet.</p>'}</body></html>`);
  });

  return router;
}
