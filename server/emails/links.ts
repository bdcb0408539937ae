import type { Config } from '../config';
import { esc } from './escape';
import { LIST_NAME, type MailList, unsubscribeToken } from './unsubscribe';

export const unsubscribeUrl = (config: Config, userId: string, list: MailList) => `${config.KEYOFF_URL}/api/email/unsubscribe?token=${unsubscribeToken(config.AUTH_SECRET, userId, list)}`;

/** RFC 8058 one-click unsubscribe: mail programs POST to the address in List-Unsubscribe. */
export const listHeaders = (config: Config, userId: string, list: MailList) => ({
  'List-Unsubscribe': `<${unsubscribeUrl(config, userId, list)}>`,
  'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
});

export const footerFor = (config: Config, userId: string, list: MailList) => [
  `You get ${LIST_NAME[list]} because you share this rig on Keyoff. <a href="${esc(unsubscribeUrl(config, userId, list))}">Turn off ${LIST_NAME[list]}</a> in one click, or choose in <a href="${esc(`${config.KEYOFF_URL}/settings`)}">Settings</a>.`,
  'Keyoff: your vehicle’s battery budget. Figures are estimates from the model, not a guarantee.',
];
