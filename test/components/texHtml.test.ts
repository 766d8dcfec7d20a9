/**
 * texHtml: the KaTeX markup the pages insert, remembered by TeX string. The expected markup is KaTeX's own
 * renderToString with the handbook's options (the library is the outside reference); remembering must give the
 * same bytes for the same string and keep inline and display forms apart, and trust stays off. Equations that
 * differ only in their digits are filled into a template (digitTemplate.ts): random equations of a few forms, with
 * digit runs of every length, as coefficients, exponents, bases of powers and in subscripts, give KaTeX's markup.
 */
import fc from 'fast-check';
import katex from 'katex';
import { digitForm } from '../../src/components/lib/digitTemplate.ts';
import { describe, expect, it, vi } from 'vitest';
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

  it('texHtml of equations that differ only in their digits is KaTeX renderToString, filled in or typeset', () => {
    // Forms as equationTex writes them (and a few more): # stands for a run of digits, drawn anew for each equation.
    const forms = [
      'c_p = #.# + #.#\\,T - #.#\\times10^{-#}\\,T^{#}',
      '\\ln \\mu = -#.# + #.#\\times10^{#}\\,(1/T) - #\\times10^{-#}\\,(1/T)^{#}',
      '\\varepsilon_{th} = #.# - #\\,T + #.#\\times10^{-#}\\,T^{#}',
      "\\rho' = # + #.#\\,t",
      'p_\\sigma = #^{#} + #_{#}\\,(\\ln T)',
      '\\Delta h_{lv} = #.#\\,T_{#} - #.#\\times#^{-#}',
      'y = #.#,#',
    ];
    // Runs of one digit now and then (a form differs in which runs have one digit), mostly of 2 to 12.
    const length = fc.oneof({ weight: 1, arbitrary: fc.constant(1) }, { weight: 6, arbitrary: fc.integer({ min: 2, max: 12 }) });
    const run = length.chain((n) => fc.array(fc.integer({ min: 0, max: 9 }), { minLength: n, maxLength: n }).map((digits) => digits.join('')));
    const reference = katex.renderToString.bind(katex);
    const typeset = vi.spyOn(katex, 'renderToString');
    let draws = 0;
    let typesettings = 0;
    try {
      fc.assert(
        fc.property(fc.integer({ min: 0, max: forms.length - 1 }), fc.boolean(), fc.array(run, { minLength: 12, maxLength: 12 }), (which, display, runs) => {
          let next = 0;
          const tex = forms[which]!.replace(/#/g, () => runs[next++]!);
          expect(digitForm(tex), tex).toBeDefined();
          expect(texHtml(tex, display), tex).toBe(reference(tex, options(display)));
          draws++;
        }),
        { numRuns: 4000 },
      );
      typesettings = typeset.mock.calls.length;
    } finally {
      typeset.mockRestore();
    }
    // Most equations were filled in, not typeset (each form costs at most three typesettings).
    expect(draws).toBe(4000);
    expect(typesettings).toBeGreaterThan(0);
    expect(typesettings).toBeLessThan(draws / 2);
  });

  it('texHtml typesets TeX beyond what can be filled in (other commands, a width that counts)', () => {
    for (const tex of ['\\widehat{12} = 3', '\\widehat{1234} = 3', '\\sqrt{2} = 1.4', '\\kern1em 2', '\\kern2em 2']) {
      expect(digitForm(tex)).toBeUndefined();
      for (let i = 0; i < 3; i++) expect(texHtml(tex, true)).toBe(katex.renderToString(tex, options(true)));
    }
  });
});
