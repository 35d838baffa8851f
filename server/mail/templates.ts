// Trailtally's e-mails: a plain-text part and a simple HTML part, the product's name, and no
// tracking (no pixels, no rewritten links, no remote images).
import type { MailMessage } from './mailer';

const escapeHtml = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

type Letter = { to: string; subject: string; lines: string[]; action: { label: string; url: string }; footer: string };

function compose({ to, subject, lines, action, footer }: Letter): MailMessage {
  const text = [...lines, '', `${action.label}: ${action.url}`, '', footer, '', '— Trailtally'].join('\n');
  const paragraphs = lines.map((line) => `<p style="margin:0 0 12px">${escapeHtml(line)}</p>`).join('');
  const html = `<!doctype html><html><body style="font-family:Nunito,Arial,sans-serif;background:#FCF6EC;color:#14213D;padding:24px">
<div style="max-width:520px;margin:0 auto;background:#FFFDF8;border-radius:16px;padding:24px;border:1px solid #E6DDCC">
<p style="font-weight:800;color:#2D6A4F;font-size:18px;margin:0 0 16px">Trailtally</p>${paragraphs}
<p style="margin:20px 0"><a href="${escapeHtml(action.url)}" style="background:#2D6A4F;color:#fff;padding:12px 20px;border-radius:999px;text-decoration:none;font-weight:700">${escapeHtml(action.label)}</a></p>
<p style="margin:0 0 12px;font-size:13px;color:#4A5568">Or paste this link into your browser: ${escapeHtml(action.url)}</p>
<p style="margin:0;font-size:13px;color:#4A5568">${escapeHtml(footer)}</p></div></body></html>`;
  return { to, subject, text, html };
}

export function tripInviteMail(input: {
  to: string;
  inviterName: string;
  tripName: string;
  role: string;
  message?: string;
  url: string;
  expiresOn: string;
}): MailMessage {
  return compose({
    to: input.to,
    subject: `${input.inviterName} invited you to plan "${input.tripName}" on Trailtally`,
    lines: [
      `${input.inviterName} invited you to the trip "${input.tripName}" as ${input.role}.`,
      ...(input.message ? [`Their note: ${input.message}`] : []),
      'Open the link to sign in or create an account, then join the trip.',
    ],
    action: { label: 'Join the trip', url: input.url },
    footer: `The link works once and expires on ${input.expiresOn}. If you were not expecting it, ignore this e-mail.`,
  });
}

export function clubInviteMail(input: {
  to: string;
  name?: string;
  inviterName: string;
  clubName: string;
  url: string;
  expiresOn: string;
}): MailMessage {
  return compose({
    to: input.to,
    subject: `Join ${input.clubName} on Trailtally`,
    lines: [
      `${input.name ? `Hello ${input.name}, ` : ''}${input.inviterName} invited your household to the club "${input.clubName}".`,
      'Club members can see the trips the club shares and copy them onto their own rig to check their own budget.',
    ],
    action: { label: 'Join the club', url: input.url },
    footer: `The link works once and expires on ${input.expiresOn}. If you were not expecting it, ignore this e-mail.`,
  });
}

export function verifyEmailMail(input: { to: string; name: string; url: string }): MailMessage {
  return compose({
    to: input.to,
    subject: 'Confirm your e-mail address for Trailtally',
    lines: [`Hello ${input.name}, please confirm that this is your e-mail address.`],
    action: { label: 'Confirm my address', url: input.url },
    footer: 'If you did not create a Trailtally account, ignore this e-mail.',
  });
}

export function resetPasswordMail(input: { to: string; name: string; url: string }): MailMessage {
  return compose({
    to: input.to,
    subject: 'Reset your Trailtally password',
    lines: [`Hello ${input.name}, someone asked to reset the password of your Trailtally account.`],
    action: { label: 'Choose a new password', url: input.url },
    footer: 'The link expires in an hour. If it was not you, ignore this e-mail: your password stays as it is.',
  });
}
