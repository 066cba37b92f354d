import { ROLE_LABELS, type Role } from '@shared/constants/roles';
import { INVITE_VALID_DAYS, PASSWORD_RESET_VALID_MINUTES } from '@shared/constants/security';

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

export const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function layout(clubName: string, paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`).join('');
  return `<!doctype html><html><body style="font-family:Nunito,Arial,sans-serif;color:#0a2631;background:#fbf9f4;padding:24px">
<div style="max-width:520px;margin:auto;background:#fff;border-radius:14px;padding:24px">
<p style="margin:0 0 8px;font-weight:800;color:#18576b">${escapeHtml(clubName)} · Shoalwise</p>${body}
<p style="margin:20px 0"><a href="${escapeHtml(link.href)}" style="background:#18576b;color:#fff;padding:12px 20px;border-radius:999px;text-decoration:none;font-weight:700">${escapeHtml(link.label)}</a></p>
<p style="font-size:13px;color:#3fa3ba">If the button does not work, copy this address into your browser: ${escapeHtml(link.href)}</p>
</div></body></html>`;
}

export function inviteMail(p: {
  clubName: string;
  inviterName: string;
  role: Role;
  link: string;
}): RenderedMail {
  const lines = [
    `${p.inviterName} invites you to join ${p.clubName} on Shoalwise as ${ROLE_LABELS[p.role].toLowerCase()}.`,
    'Shoalwise is where the club keeps its tanks, water tests and mentoring in one place.',
    `The link works once and for ${INVITE_VALID_DAYS} days.`,
  ];
  return {
    subject: `You're invited to ${p.clubName}`,
    text: `${lines.join('\n\n')}\n\nAccept the invitation: ${p.link}\n\nIf you did not expect this, ignore this e-mail.`,
    html: layout(p.clubName, [...lines, 'If you did not expect this, ignore this e-mail.'], {
      href: p.link,
      label: 'Accept the invitation',
    }),
  };
}

export function passwordResetMail(p: { clubName: string; link: string }): RenderedMail {
  const lines = [
    'Someone (hopefully you) asked to reset your Shoalwise password.',
    `The link works once and for ${PASSWORD_RESET_VALID_MINUTES} minutes. Resetting signs you out everywhere else.`,
    'If you did not ask, ignore this e-mail: your password stays as it is.',
  ];
  return {
    subject: 'Reset your Shoalwise password',
    text: `${lines.join('\n\n')}\n\nChoose a new password: ${p.link}`,
    html: layout(p.clubName, lines, { href: p.link, label: 'Choose a new password' }),
  };
}
