import type { OutgoingMail } from '../mail/mail.service.js';

const FOOTER = '\n\nIf you did not ask for this, you can ignore this message.\n— Endgrain';

export function verificationMail(to: string, name: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your e-mail for Endgrain',
    text: `Hello ${name},\n\nConfirm your e-mail address by opening this link (valid for 48 hours):\n${link}${FOOTER}`,
    html: `<p>Hello ${escapeHtml(name)},</p><p>Confirm your e-mail address by opening this link (valid for 48 hours):</p><p><a href="${link}">${link}</a></p><p>If you did not ask for this, you can ignore this message.<br>— Endgrain</p>`,
  };
}

export function resetMail(to: string, name: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Endgrain password',
    text: `Hello ${name},\n\nSet a new password by opening this link (valid for one hour, once):\n${link}${FOOTER}`,
    html: `<p>Hello ${escapeHtml(name)},</p><p>Set a new password by opening this link (valid for one hour, once):</p><p><a href="${link}">${link}</a></p><p>If you did not ask for this, you can ignore this message.<br>— Endgrain</p>`,
  };
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
