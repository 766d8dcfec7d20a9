/**
 * A hostile handbook for the safety test: every text field of the metadata, the TeX symbols and the data file's
 * note column carry payloads that would run in a browser or a spreadsheet if any of them were written as HTML,
 * as a URL or as a formula. Every payload carries the marker PWNED so that the test can find where it went.
 * Payloads: common practice (OWASP XSS filter evasion and CSV injection cheat sheets), written from memory.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';

export const MARKER = 'PWNED';

/** Text payloads, one per hostile folder. */
export const TEXT_PAYLOADS: readonly string[] = [
  `<script>alert("${MARKER}")</script>`,
  `<img src=x onerror=alert('${MARKER}')>`,
  `"><svg onload=alert('${MARKER}')>`,
  `javascript:alert('${MARKER}')`,
  `</script><script>alert('${MARKER}')</script><!--`,
  `=HYPERLINK("http://example.invalid/${MARKER}","open")`,
  `<a href="javascript:alert('${MARKER}')">x</a> @SUM(1+1)`,
  `+cmd|' /C calc'!A0 -${MARKER} <iframe src="javascript:alert('${MARKER}')">`,
  // An http(s) address with '&': Astro 5.18 writes such attribute values unescaped (attributeEscapingIntegration.ts).
  `https://x.example/?a&b="><img src=x onerror=alert('${MARKER}')>`,
];

/** TeX payloads for the symbols (KaTeX must parse them; with trust off the commands stay inert text). */
export const TEX_PAYLOADS: readonly string[] = [
  String.raw`\href{javascript:alert('${MARKER}')}{x}`,
  String.raw`\url{javascript:alert('${MARKER}')}`,
  String.raw`\htmlData{onclick=alert('${MARKER}')}{x}`,
  String.raw`\includegraphics{javascript:${MARKER}}`,
  String.raw`</script><img src=x onerror=alert('${MARKER}')>`,
  String.raw`\htmlClass{x onmouseover=alert('${MARKER}')}{y}`,
  String.raw`\text{<script>alert("${MARKER}")</script>}`,
  String.raw`\htmlStyle{background:url(javascript:${MARKER})}{x}`,
];

/** A CSV field, quoted when it needs it (RFC 4180). */
function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** YAML double-quoted scalar (JSON strings are valid YAML). */
const q = (text: string): string => JSON.stringify(text);

/** The metadata of hostile folder `index`, every text field carrying `text` and both symbols carrying `tex`. */
function hostileYaml(index: number, text: string, tex: string): string {
  return [
    '# Invented hostile fixture for the safety test; not data.',
    `title: ${q(`${text} title ${index}`)}`,
    'invented: true',
    'property:',
    `  name: ${q(`${text} property`)}`,
    `  symbol: ${q(tex)}`,
    `  unit: ${q(`${text} unit`)}`,
    'variable:',
    `  name: ${q(`${text} variable`)}`,
    `  symbol: ${q(tex)}`,
    `  unit: ${q(`${text} K`)}`,
    'material:',
    `  name: ${q(`${text} material`)}`,
    `  phase: ${q(text)}`,
    `  pressure: ${q(text)}`,
    `  grade: ${q(text)}`,
    `  conditions: ${q(text)}`,
    'source:',
    `  citation: ${q(text)}`,
    '  method: derived',
    `  derivedFrom: ${q(text)}`,
    '  date: 2026-01-01',
    `  preparedBy: ${q(text)}`,
    `  notes: ${q(text)}`,
    'uncertainty:',
    `  statement: ${q(text)}`,
    'data:',
    '  x: T',
    '  y: v',
    '  note: note',
    'fit:',
    ...(index % 2 === 0 ? ['  order: 2', `  reason: ${q(text)}`] : []),
    '  exclude:',
    '    - row: 1',
    `      reason: ${q(text)}`,
    'tags:',
    `  - ${q(text)}`,
    'review:',
    '  status: in-review',
    `  reviewer: ${q(text)}`,
    `  notes: ${q(text)}`,
    '',
  ].join('\n');
}

/** Twelve points on a gentle curve with fixed small offsets, every note carrying `text`. */
function hostileCsv(text: string): string {
  const rows = Array.from({ length: 12 }, (_, i) => {
    const x = 280 + 10 * i;
    const y = 1900 + 1.2 * (x - 280) + 0.001 * (x - 280) ** 2 + [0.4, -0.3, 0.2, -0.5, 0.1, 0.3, -0.2, 0.4, -0.1, -0.3, 0.2, 0][i]!;
    return `${x},${y.toFixed(2)},${csvField(`${text} note ${i}`)}`;
  });
  return `T,v,note\n${rows.join('\n')}\n`;
}

/** Write one hostile folder per payload under `directory`; returns their slugs. */
export async function writeHostileHandbook(directory: string): Promise<string[]> {
  const slugs: string[] = [];
  for (const [index, text] of TEXT_PAYLOADS.entries()) {
    const slug = `hostile-${index}`;
    const folder = path.join(directory, slug);
    await mkdir(folder, { recursive: true });
    await writeFile(path.join(folder, 'correlation.yaml'), hostileYaml(index, text, TEX_PAYLOADS[index % TEX_PAYLOADS.length]!));
    await writeFile(path.join(folder, 'data.csv'), hostileCsv(text));
    slugs.push(slug);
  }
  return slugs;
}
