import { cleanup, render } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { MarkdownLite } from '@client/features/questions/components/markdown-lite';
import { parseMarkdownLite, safeHref } from '@client/features/questions/lib/markdown-lite';

const renderText = (text: string, names: string[] = []) =>
  render(<MarkdownLite text={text} mentionNames={names} />).container;

describe('markdown-lite in threads', () => {
  afterEach(cleanup);

  it('when a message holds HTML, then it shows as the characters typed and no element is created from it', () => {
    const html =
      'Hi <script>alert(1)</script> <img src=x onerror="alert(2)"> <b>bold?</b> <a href="javascript:alert(3)">x</a>';
    const c = renderText(html);
    expect(c.querySelector('script, img, b, iframe')).toBeNull();
    expect(c.querySelectorAll('a')).toHaveLength(0);
    expect(c.textContent).toBe(html);
  });

  it('when a link is not http(s) or a path inside the app, then it stays plain text', () => {
    const bad = [
      'javascript:alert(1)',
      'JaVaScRiPt:alert(1)',
      'data:text/html,<script>x</script>',
      'vbscript:msgbox',
      '//evil.example/x',
      '/\\evil.example',
      'java\tscript:alert(1)',
      'file:///etc/passwd',
    ];
    for (const url of bad) {
      const c = renderText(`[click me](${url}) and ${url}`);
      expect(c.querySelectorAll('a'), url).toHaveLength(0);
      expect(c.textContent).toContain('click me');
    }
    expect(safeHref(' javascript:alert(1)')).toBeNull();
    expect(safeHref('https://example.org/a b')).toBeNull();
  });

  it('when links are safe, then they open without passing our page along', () => {
    const c = renderText(
      'See [the guide](https://guide.example/nitrate?x=1) or https://other.example/page. And [my tank](/tanks/abc).',
    );
    const links = [...c.querySelectorAll('a')];
    expect(
      links.map((a) => [
        a.textContent,
        a.getAttribute('href'),
        a.getAttribute('rel'),
        a.getAttribute('target'),
      ]),
    ).toEqual([
      ['the guide', 'https://guide.example/nitrate?x=1', 'noopener noreferrer nofollow', '_blank'],
      ['https://other.example/page', 'https://other.example/page', 'noopener noreferrer nofollow', '_blank'],
      ['my tank', '/tanks/abc', 'noopener noreferrer nofollow', null],
    ]);
    // The full stop after a bare address is the sentence's, not the address's.
    expect(c.textContent).toContain('other.example/page. And');
  });

  it('when a message has bold, lists and line breaks, then they become those elements', () => {
    const c = renderText(
      'Do a **30 %** water change, then:\n- test **ammonia**\n- test nitrite\n\n1. wait a day\n2. test again\nthanks\nMilo',
    );
    expect([...c.querySelectorAll('strong')].map((s) => s.textContent)).toEqual(['30 %', 'ammonia']);
    expect([...c.querySelectorAll('ul > li')].map((li) => li.textContent)).toEqual([
      'test ammonia',
      'test nitrite',
    ]);
    expect([...c.querySelectorAll('ol > li')].map((li) => li.textContent)).toEqual([
      'wait a day',
      'test again',
    ]);
    expect(c.querySelectorAll('p')).toHaveLength(2);
    expect(c.querySelectorAll('br')).toHaveLength(1);
  });

  it('when a known name follows @, then it is marked as a mention; an e-mail address is not', () => {
    const c = renderText('@Ada Admin can you look? mail ada@club.example', ['Ada Admin']);
    const marked = [...c.querySelectorAll('span')].map((s) => s.textContent);
    expect(marked).toEqual(['@Ada Admin']);
  });

  it('when markers are unbalanced or empty, then the text is kept as typed', () => {
    expect(parseMarkdownLite('** not bold ** and **open')).toEqual([
      { type: 'paragraph', children: [{ type: 'text', text: '** not bold ** and **open' }] },
    ]);
    expect(parseMarkdownLite('')).toEqual([]);
    // An empty label is no Markdown link; the address inside still links on its own.
    const c = renderText('[](https://x.example)');
    expect(c.textContent).toBe('[](https://x.example)');
    expect([...c.querySelectorAll('a')].map((a) => a.getAttribute('href'))).toEqual(['https://x.example/']);
  });
});
