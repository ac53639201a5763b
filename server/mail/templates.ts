import { ROLE_LABELS, type Role } from '@shared/auth/roles';

/** Plain-text mail bodies with a simple HTML twin; links are written out in full. */

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function html(paragraphs: string[], link: { href: string; label: string }): string {
  return [
    '<div style="font-family:sans-serif;font-size:16px;line-height:1.5;color:#14202B">',
    ...paragraphs.map((p) => `<p>${escape(p)}</p>`),
    `<p><a href="${escape(link.href)}">${escape(link.label)}</a></p>`,
    `<p style="color:#4A5561;font-size:14px">${escape(link.href)}</p>`,
    '</div>',
  ].join('');
}

export function inviteMail(p: { shopName: string; inviter: string; role: Role; link: string; expiresAt: Date }) {
  const lines = [
    `${p.inviter} invited you to join ${p.shopName} on Probepath as ${ROLE_LABELS[p.role].toLowerCase()}.`,
    `Open the link to choose your password and join. It works once and expires on ${p.expiresAt.toUTCString()}.`,
  ];
  return {
    subject: `You're invited to ${p.shopName} on Probepath`,
    text: `${lines.join('\n\n')}\n\n${p.link}\n`,
    html: html(lines, { href: p.link, label: 'Accept the invite' }),
  };
}

export function resetMail(p: { name: string; link: string; expiresAt: Date }) {
  const lines = [
    `Hello ${p.name},`,
    `Someone asked to reset your Probepath password. Open the link to choose a new one. It works once and expires at ${p.expiresAt.toUTCString()}.`,
    'If it was not you, ignore this message: your password stays as it is.',
  ];
  return {
    subject: 'Reset your Probepath password',
    text: `${lines.join('\n\n')}\n\n${p.link}\n`,
    html: html(lines, { href: p.link, label: 'Choose a new password' }),
  };
}
