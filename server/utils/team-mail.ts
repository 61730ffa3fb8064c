import { escapeHtml } from '../../shared/text/escape-html'

/** The parts of a team mail: a heading, plain paragraphs, one link with its label. */
export interface TeamMailContent {
  workspace: string
  heading: string
  paragraphs: string[]
  link: string
  linkLabel: string
}

/**
 * A mail's text and HTML parts from the same content: the workspace name on top, the paragraphs,
 * the link (written out in the text part; a button and the written link in the HTML part).
 * Every piece of text is escaped in the HTML part, so a sketch title or a comment cannot inject markup.
 */
export function teamMail(content: TeamMailContent): { text: string; html: string } {
  const text = [
    `${content.workspace} (Kernwise)`,
    '',
    content.heading,
    '',
    ...content.paragraphs.flatMap(p => [p, '']),
    `${content.linkLabel}: ${content.link}`,
    '',
    'You receive this because someone in this Kernwise workspace named your address.',
    '',
  ].join('\n')
  const e = escapeHtml
  const html = `<!doctype html><html><body style="font-family: sans-serif; color: #1f2933; max-width: 560px">
<p style="font-size: 12px; color: #52606d">${e(content.workspace)} · Kernwise</p>
<h1 style="font-size: 18px">${e(content.heading)}</h1>
${content.paragraphs.map(p => `<p>${e(p)}</p>`).join('\n')}
<p><a href="${e(content.link)}" style="display: inline-block; padding: 8px 14px; background: #1d4ed8; color: #ffffff; text-decoration: none; border-radius: 4px">${e(content.linkLabel)}</a></p>
<p style="font-size: 12px; color: #52606d">Or open: ${e(content.link)}</p>
<p style="font-size: 12px; color: #52606d">You receive this because someone in this Kernwise workspace named your address.</p>
</body></html>`
  return { text, html }
}
