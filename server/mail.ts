import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from 'pino';

import type { Config } from './config';
import { esc } from './emails/escape';

export type Mail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  headers?: Record<string, string>;
  attachments?: { filename: string; content: Buffer; cid?: string; contentType?: string }[];
};
export type Mailer = { send: (mail: Mail) => Promise<void> };

/** nodemailer to the SMTP server in the configuration (maildev on 127.0.0.1:1025 locally). */
export function createMailer(config: Config, logger: Logger): Mailer {
  const transport: Transporter = nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE,
    ignoreTLS: !config.SMTP_SECURE,
    auth: config.SMTP_USER ? { user: config.SMTP_USER, pass: config.SMTP_PASSWORD } : undefined,
  });
  return {
    async send(mail) {
      const info = await transport.sendMail({ from: config.MAIL_FROM, ...mail });
      logger.info({ to: mail.to, subject: mail.subject, messageId: info.messageId }, 'mail sent');
    },
  };
}


/** Keyoff's own e-mail layout: a heading, a few lines, one button, the link spelled out. */
export function layout(opts: { to: string; subject: string; heading: string; lines: string[]; action: { label: string; url: string }; footer?: string }): Mail {
  const text = [opts.heading, '', ...opts.lines, '', `${opts.action.label}: ${opts.action.url}`, '', opts.footer ?? 'Keyoff: your vehicle\'s battery budget.'].join('\n');
  const html = `<!doctype html><html><body style="margin:0;background:#F6F3EC;font-family:Nunito,Segoe UI,Helvetica,Arial,sans-serif;color:#1C2630">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:24px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="background:#FFFFFF;border:1px solid #D9D3C7;border-radius:16px">
<tr><td style="background:#17324A;color:#F6F3EC;padding:16px 24px;border-radius:16px 16px 0 0;font-size:20px;font-weight:800">Keyoff</td></tr>
<tr><td style="padding:24px"><h1 style="font-size:20px;margin:0 0 12px">${esc(opts.heading)}</h1>
${opts.lines.map((l) => `<p style="font-size:15px;line-height:22px;margin:0 0 12px">${esc(l)}</p>`).join('\n')}
<p style="margin:20px 0"><a href="${esc(opts.action.url)}" style="background:#17324A;color:#F6F3EC;padding:12px 20px;border-radius:10px;text-decoration:none;font-weight:700">${esc(opts.action.label)}</a></p>
<p style="font-size:13px;color:#55626F;word-break:break-all">Or open this link: ${esc(opts.action.url)}</p></td></tr>
<tr><td style="padding:16px 24px;font-size:13px;color:#55626F">${esc(opts.footer ?? "Keyoff: your vehicle's battery budget.")}</td></tr>
</table></td></tr></table></body></html>`;
  return { to: opts.to, subject: opts.subject, text, html };
}

export const templates = {
  verifyEmail: (to: string, name: string, url: string) =>
    layout({
      to,
      subject: 'Confirm your e-mail address for Keyoff',
      heading: `Welcome to Keyoff, ${name}`,
      lines: ['Confirm your e-mail address to start keeping your rig\'s battery budget.', 'If you did not sign up, ignore this message.'],
      action: { label: 'Confirm my address', url },
    }),
  resetPassword: (to: string, name: string, url: string) =>
    layout({
      to,
      subject: 'Reset your Keyoff password',
      heading: 'A new password for Keyoff',
      lines: [`Hello ${name}, someone asked to reset the password of this Keyoff account.`, 'The link works once and expires in one hour. If it was not you, ignore this message.'],
      action: { label: 'Choose a new password', url },
    }),
  invitation: (to: string, inviter: string, household: string, role: string, url: string) =>
    layout({
      to,
      subject: `${inviter} invites you to ${household} on Keyoff`,
      heading: `Join ${household} on Keyoff`,
      lines: [
        `${inviter} invites you to share their rig's battery budget as ${role === 'advisor' ? 'an advisor (you can read everything and comment)' : `a ${role}`}.`,
        'Sign in or create an account with this address, then accept. The invitation works once and expires in 7 days.',
      ],
      action: { label: 'See the invitation', url },
    }),
};
