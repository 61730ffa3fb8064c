import { describe, expect, it } from 'vitest'
import { teamMail } from '../../../server/utils/team-mail'

describe('teamMail(content)', () => {
  const mail = teamMail({
    workspace: 'Harbour <Works>',
    heading: 'Ana shared “Plate & angle” with you',
    paragraphs: ['A comment: <script>alert(1)</script>'],
    link: 'http://127.0.0.1:3000/sketches/abc?x=1&y=2',
    linkLabel: 'Open it',
  })

  it('the text part holds the workspace, the heading, the paragraphs and the written-out link', () => {
    expect(mail.text).toContain('Harbour <Works> (Kernwise)')
    expect(mail.text).toContain('A comment: <script>alert(1)</script>')
    expect(mail.text).toContain('Open it: http://127.0.0.1:3000/sketches/abc?x=1&y=2')
  })

  it('the HTML part escapes every text, so a title or comment cannot add markup', () => {
    expect(mail.html).not.toContain('<script>')
    expect(mail.html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;')
    expect(mail.html).toContain('Harbour &lt;Works&gt;')
    expect(mail.html).toContain('href="http://127.0.0.1:3000/sketches/abc?x=1&amp;y=2"')
  })
})
