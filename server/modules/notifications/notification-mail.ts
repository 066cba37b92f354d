import { NOTIFICATION_KIND_LABELS, type UnsubscribeScope } from '@shared/constants/notifications';
import { escapeHtml } from '../../mail/templates';
import type { OutgoingMail } from '../../mail/mailer';
import type { Notification } from './notification.entity';
import { unsubscribeUrl } from './unsubscribe-token';

export interface MailLinks {
  baseUrl: string;
  sessionSecret: string;
}

export interface Recipient {
  id: string;
  email: string;
  displayName: string;
}

interface Footer {
  why: string;
  stopLabel: string;
  stopUrl: string;
  allUrl: string;
  settingsUrl: string;
}

function footerFor(
  links: MailLinks,
  userId: string,
  scope: UnsubscribeScope,
  why: string,
  stopLabel: string,
): Footer {
  return {
    why,
    stopLabel,
    stopUrl: unsubscribeUrl(links.baseUrl, links.sessionSecret, { userId, scope }),
    allUrl: unsubscribeUrl(links.baseUrl, links.sessionSecret, { userId, scope: 'all' }),
    settingsUrl: `${links.baseUrl}/profile`,
  };
}

const footerText = (f: Footer) =>
  `${f.why}\n${f.stopLabel}: ${f.stopUrl}\nStop every Shoalwise e-mail: ${f.allUrl}\nChoose which e-mails you get: ${f.settingsUrl}`;

const footerHtml = (f: Footer) =>
  `<p style="margin:24px 0 0;font-size:13px;color:#1a6c84">${escapeHtml(f.why)}<br>
<a href="${escapeHtml(f.stopUrl)}" style="color:#18576b">${escapeHtml(f.stopLabel)}</a> ·
<a href="${escapeHtml(f.allUrl)}" style="color:#18576b">Stop every Shoalwise e-mail</a> ·
<a href="${escapeHtml(f.settingsUrl)}" style="color:#18576b">Choose which e-mails you get</a></p>`;

const page = (heading: string, inner: string, footer: Footer) =>
  `<!doctype html><html><body style="font-family:Nunito,Arial,sans-serif;color:#0a2631;background:#fbf9f4;padding:24px">
<div style="max-width:560px;margin:auto;background:#fff;border-radius:14px;padding:24px">
<p style="margin:0 0 8px;font-weight:800;color:#18576b">${escapeHtml(heading)}</p>${inner}${footerHtml(footer)}
</div></body></html>`;

const button = (href: string, label: string) =>
  `<p style="margin:20px 0"><a href="${escapeHtml(href)}" style="background:#18576b;color:#fff;padding:12px 20px;border-radius:999px;text-decoration:none;font-weight:700">${escapeHtml(label)}</a></p>`;

/** Mail clients show an unsubscribe button from these; the POST form is RFC 8058 one-click. */
const listHeaders = (f: Footer) => ({
  'List-Unsubscribe': `<${f.stopUrl}>`,
  'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
});

/** One notification, sent at once because the person chose "right away" for its kind. */
export function immediateMail(p: {
  to: Recipient;
  clubName: string;
  notification: Notification;
  links: MailLinks;
}): OutgoingMail {
  const n = p.notification;
  const url = `${p.links.baseUrl}${n.link}`;
  const label = NOTIFICATION_KIND_LABELS[n.kind].label;
  const footer = footerFor(
    p.links,
    p.to.id,
    n.kind,
    `You get "${label}" e-mails right away from ${p.clubName} on Shoalwise.`,
    `Stop "${label}" e-mails`,
  );
  const bodyText = n.body ? `\n\n${n.body}` : '';
  return {
    to: p.to.email,
    subject: `${p.clubName}: ${n.title}`,
    text: `${n.title}${bodyText}\n\nOpen it in Shoalwise: ${url}\n\n— ${p.clubName} on Shoalwise\n\n${footerText(footer)}`,
    html: page(
      `${p.clubName} · Shoalwise`,
      `<h1 style="margin:0 0 12px;font-size:20px">${escapeHtml(n.title)}</h1>${n.body ? `<p style="margin:0 0 14px;white-space:pre-line">${escapeHtml(n.body)}</p>` : ''}${button(url, 'Open in Shoalwise')}`,
      footer,
    ),
    headers: listHeaders(footer),
  };
}

export interface DigestItem {
  clubName: string;
  notification: Notification;
}

/** The morning round-up: everything in digest mode that the person has not read or been e-mailed yet. */
export function digestMail(p: {
  to: Recipient;
  items: DigestItem[];
  localDate: string;
  links: MailLinks;
}): OutgoingMail {
  const byClub = new Map<string, Notification[]>();
  for (const i of p.items) byClub.set(i.clubName, [...(byClub.get(i.clubName) ?? []), i.notification]);
  const footer = footerFor(
    p.links,
    p.to.id,
    'digest',
    'You get this digest once a day, in the morning, when something new happened.',
    'Stop the daily digest',
  );
  const count = p.items.length;
  const first = p.to.displayName.split(' ')[0] ?? p.to.displayName;
  const intro = `Good morning, ${first}. ${count === 1 ? 'One thing' : `${count} things`} happened in your club${byClub.size > 1 ? 's' : ''} since your last digest.`;
  const text = [...byClub]
    .map(
      ([club, list]) =>
        `${club}\n${list.map((n) => `- ${n.title}${n.body ? ` — ${n.body}` : ''}\n  ${p.links.baseUrl}${n.link}`).join('\n')}`,
    )
    .join('\n\n');
  const html = [...byClub]
    .map(
      ([club, list]) =>
        `<h2 style="margin:20px 0 8px;font-size:16px">${escapeHtml(club)}</h2><ul style="margin:0;padding-left:20px">${list
          .map(
            (n) =>
              `<li style="margin:0 0 10px"><a href="${escapeHtml(`${p.links.baseUrl}${n.link}`)}" style="color:#18576b;font-weight:700">${escapeHtml(n.title)}</a>${n.body ? `<br><span>${escapeHtml(n.body)}</span>` : ''}</li>`,
          )
          .join('')}</ul>`,
    )
    .join('');
  return {
    to: p.to.email,
    subject: `Your Shoalwise digest for ${p.localDate}: ${count} update${count === 1 ? '' : 's'}`,
    text: `${intro}\n\n${text}\n\n${footerText(footer)}`,
    html: page(
      'Shoalwise · daily digest',
      `<p style="margin:0 0 14px">${escapeHtml(intro)}</p>${html}${button(`${p.links.baseUrl}/`, 'Open Shoalwise')}`,
      footer,
    ),
    headers: listHeaders(footer),
  };
}
