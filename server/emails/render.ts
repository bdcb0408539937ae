import mjml2html from 'mjml';

import { colors } from '@/shared/theme';

import { esc } from './escape';

export type Section = { heading?: string; lines?: string[]; rows?: [string, string][]; image?: { cid: string; alt: string }; caution?: string };
export type Letter = {
  preview: string;
  heading: string;
  intro: string[];
  sections: Section[];
  action: { label: string; url: string };
  footer: string[];
};

/** One MJML layout for every Keyoff e-mail (one column, readable on a phone), and the plain-text twin. */
export async function renderLetter(letter: Letter): Promise<{ html: string; text: string }> {
  const section = (s: Section) => `
    <mj-section background-color="#FFFFFF" padding="8px 16px"><mj-column>
      ${s.heading ? `<mj-text font-size="17px" font-weight="700" padding="8px 8px 4px">${esc(s.heading)}</mj-text>` : ''}
      ${s.rows?.length ? `<mj-table padding="4px 8px" font-size="14px" line-height="20px">${s.rows.map(([a, b]) => `<tr><td style="padding:3px 0">${esc(a)}</td><td style="padding:3px 0;text-align:right;font-weight:700">${esc(b)}</td></tr>`).join('')}</mj-table>` : ''}
      ${(s.lines ?? []).map((l) => `<mj-text padding="2px 8px">${esc(l)}</mj-text>`).join('')}
      ${s.image ? `<mj-image src="cid:${esc(s.image.cid)}" alt="${esc(s.image.alt)}" padding="8px" />` : ''}
      ${s.caution ? `<mj-text padding="6px 8px" font-size="13px" color="${colors.tight}">${esc(s.caution)}</mj-text>` : ''}
    </mj-column></mj-section>`;
  const source = `<mjml><mj-head><mj-title>${esc(letter.heading)}</mj-title><mj-preview>${esc(letter.preview)}</mj-preview>
    <mj-attributes><mj-all font-family="Nunito, Segoe UI, Helvetica, Arial, sans-serif" /><mj-text font-size="15px" line-height="22px" color="${colors.ink}" /></mj-attributes></mj-head>
    <mj-body background-color="${colors.paper}" width="600px">
      <mj-section background-color="${colors.night}" padding="12px 16px" border-radius="16px 16px 0 0"><mj-column><mj-text color="${colors.paper}" font-size="20px" font-weight="800">Keyoff</mj-text></mj-column></mj-section>
      <mj-section background-color="#FFFFFF" padding="16px 16px 0"><mj-column>
        <mj-text font-size="21px" font-weight="800" line-height="28px" padding="4px 8px">${esc(letter.heading)}</mj-text>
        ${letter.intro.map((l) => `<mj-text padding="2px 8px">${esc(l)}</mj-text>`).join('')}
      </mj-column></mj-section>
      ${letter.sections.map(section).join('')}
      <mj-section background-color="#FFFFFF" padding="8px 16px 20px" border-radius="0 0 16px 16px"><mj-column>
        <mj-button href="${esc(letter.action.url)}" background-color="${colors.night}" color="${colors.paper}" border-radius="10px" font-weight="700" align="left" padding="8px">${esc(letter.action.label)}</mj-button>
        <mj-text font-size="13px" color="${colors.inkSoft}" padding="2px 8px">Or open ${esc(letter.action.url)}</mj-text>
      </mj-column></mj-section>
      <mj-section padding="8px 16px"><mj-column>${letter.footer.map((f) => `<mj-text font-size="12px" color="${colors.inkSoft}" padding="2px 8px">${f}</mj-text>`).join('')}</mj-column></mj-section>
    </mj-body></mjml>`;
  const out = await mjml2html(source, { validationLevel: 'strict' });
  if (out.errors?.length) throw new Error(`e-mail template: ${out.errors.map((e) => e.formattedMessage).join('; ')}`);
  const text = [
    letter.heading,
    '',
    ...letter.intro,
    ...letter.sections.flatMap((s) => ['', ...(s.heading ? [s.heading.toUpperCase()] : []), ...(s.rows ?? []).map(([a, b]) => `  ${a}: ${b}`), ...(s.lines ?? []), ...(s.image ? [`[${s.image.alt}]`] : []), ...(s.caution ? [s.caution] : [])]),
    '',
    `${letter.action.label}: ${letter.action.url}`,
    '',
    ...letter.footer.map((f) => f.replace(/<a href="([^"]+)">([^<]+)<\/a>/g, '$2: $1').replace(/<[^>]+>/g, '')),
  ].join('\n');
  return { html: out.html, text };
}
