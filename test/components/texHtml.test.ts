/**
 * texHtml: the KaTeX markup the pages insert, remembered by TeX string. The expected markup is KaTeX's own
 * renderToString with the handbook's options (the library is the outside reference); remembering must give the
 * same bytes for the same string and keep inline and display forms apart, and trust stays off.
 */
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { texHtml } from '../../src/components/lib/texHtml.ts';

const options = (displayMode: boolean) => ({ displayMode, throwOnError: true, output: 'htmlAndMathml' as const, trust: false, maxExpand: 1000 });

describe('texHtml', () => {
  it('texHtml(tex, display) is KaTeX renderToString with the handbook options, first and later calls alike', () => {
    for (const tex of ['T', 'c_p', '\\mu', 'v = \\sum_{k=0}^{3} a_k u^k', 'u = 1/T']) {
      for (const display of [false, true]) {
        const expected = katex.renderToString(tex, options(display));
        expect(texHtml(tex, display)).toBe(expected);
        expect(texHtml(tex, display)).toBe(expected);
      }
    }
  });

  it('texHtml keeps the inline and display forms of one string apart', () => {
    expect(texHtml('x^2', true)).toContain('katex-display');
    expect(texHtml('x^2')).not.toContain('katex-display');
  });

  it('texHtml keeps \\href inert (trust off), remembered or not', () => {
    for (let i = 0; i < 2; i++) {
      const html = texHtml('\\href{javascript:alert(1)}{x}');
      expect(html).not.toMatch(/<a\b/);
      expect(html).not.toContain('href="javascript');
    }
  });

  it('texHtml throws on TeX that does not parse, every time', () => {
    expect(() => texHtml('\\frac{1}{')).toThrow(/KaTeX parse error/);
    expect(() => texHtml('\\frac{1}{')).toThrow(/KaTeX parse error/);
  });
});
