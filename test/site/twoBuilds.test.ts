/**
 * Two independent `astro build`s of the same handbook (the demo folders plus a hostile set, test/site/hostileContent.ts),
 * each in its own temporary project folder, so that machine paths would show up as differences:
 * - reproducible: both outputs hold the same files, byte for byte;
 * - safe: every built HTML page, parsed with parse5 (the HTML5 parsing algorithm browsers use), holds no element,
 *   event-handler attribute or URL from content that would run, and the payloads appear as text; the CSV download
 *   holds no cell a spreadsheet would read as a formula.
 */
import { existsSync } from 'node:fs';
import { cp, mkdtemp, readFile, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { spawn } from 'node:child_process';
import { parse, type DefaultTreeAdapterMap } from 'parse5';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeSiteProject } from '../../scripts/bench/build/benchProjects.ts';
import { MARKER, TEXT_PAYLOADS, writeHostileHandbook } from './hostileContent.ts';
import { projectRoot } from './buildSite.ts';

type Node = DefaultTreeAdapterMap['node'];
type Element = DefaultTreeAdapterMap['element'];

let root = '';
const outputs: string[] = [];
let hostileSlugs: string[] = [];

function astroBuild(cwd: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const log: string[] = [];
    const child = spawn(process.execPath, [path.join(projectRoot, 'node_modules', 'astro', 'astro.js'), 'build'], {
      cwd,
      env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', NODE_ENV: 'production' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child.stdout.on('data', (chunk: Buffer) => log.push(chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => log.push(chunk.toString()));
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`astro build in ${cwd} failed (${code}):\n${log.join('').slice(-4000)}`))));
  });
}

beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'correlary-two-builds-'));
  const projects = [path.join(root, 'first'), path.join(root, 'second-with-a-longer-path')];
  for (const project of projects) {
    await makeSiteProject(projectRoot, project);
    await cp(path.join(projectRoot, 'content'), path.join(project, 'content'), { recursive: true });
    hostileSlugs = await writeHostileHandbook(path.join(project, 'content'));
  }
  await Promise.all(projects.map(astroBuild));
  outputs.push(...projects.map((project) => path.join(project, 'dist')));
}, 240_000);

afterAll(async () => {
  if (root) await rm(root, { recursive: true, force: true });
});

async function filesUnder(folder: string): Promise<string[]> {
  const found: string[] = [];
  for (const item of await readdir(folder, { withFileTypes: true, recursive: true })) {
    if (item.isFile()) found.push(path.relative(folder, path.join(item.parentPath, item.name)));
  }
  return found.sort();
}

function* elements(node: Node): Generator<Element> {
  if ('tagName' in node) yield node;
  const children = 'childNodes' in node ? node.childNodes : [];
  for (const child of children) yield* elements(child);
  if ('content' in node && node.content) yield* elements(node.content as unknown as Node);
}

function textOf(node: Node): string {
  if (node.nodeName === '#text') return (node as DefaultTreeAdapterMap['textNode']).value;
  return 'childNodes' in node ? node.childNodes.map(textOf).join('') : '';
}

/** Attributes a browser treats as URLs (HTML and SVG, from memory of the HTML and SVG specifications). */
const URL_ATTRIBUTES = new Set(['href', 'src', 'action', 'formaction', 'data', 'poster', 'xlink:href', 'srcdoc', 'background', 'ping', 'cite']);
/** Elements that load, embed or redirect: content must never supply what they load. */
const LOADING_ELEMENTS = new Set(['iframe', 'object', 'embed', 'frame', 'frameset', 'base', 'form', 'img', 'image', 'video', 'audio', 'source', 'track', 'link', 'input', 'button']);

/**
 * Every way the page could run something that came from content, one line each. Text from content inside an
 * ordinary attribute value (a title, a data-* attribute, a meta description) is inert: parse5 has shown it stayed
 * inside the value.
 */
function activeContent(html: string): string[] {
  const problems: string[] = [];
  for (const element of elements(parse(html) as unknown as Node)) {
    const tag = element.tagName.toLowerCase();
    for (const attribute of element.attrs) {
      const name = attribute.name.toLowerCase();
      // Browsers ignore control characters and spaces when they read a URL's scheme.
      const url = attribute.value.replace(/[\u0000-\u0020]/g, '').toLowerCase();
      if (name.startsWith('on')) problems.push(`<${tag} ${name}="${attribute.value}">`);
      if (URL_ATTRIBUTES.has(name) && /^(javascript|vbscript|data):/.test(url)) problems.push(`<${tag} ${name}="${attribute.value}">`);
      if (name === 'style' && /javascript:|expression\(|url\(/.test(url) && attribute.value.includes(MARKER)) problems.push(`<${tag} style="${attribute.value}">`);
      if (LOADING_ELEMENTS.has(tag) && (URL_ATTRIBUTES.has(name) || name === 'srcset' || name === 'type') && attribute.value.includes(MARKER)) problems.push(`<${tag} ${name}> made from content`);
      if (tag === 'meta' && name === 'http-equiv') problems.push(`<meta http-equiv="${attribute.value}">`);
    }
    if (tag === 'script') {
      const type = element.attrs.find((attribute) => attribute.name === 'type')?.value ?? '';
      const body = textOf(element);
      if (type === 'application/json') {
        // The data block must parse whole: a payload that closed the element early would break it.
        try {
          JSON.parse(body);
        } catch {
          problems.push('a JSON script block does not parse (closed early?)');
        }
      } else if (body.includes(MARKER)) problems.push(`<script type="${type}"> holds the marker`);
    }
    if (tag === 'style' && textOf(element).includes(MARKER)) problems.push('<style> holds the marker');
  }
  return problems;
}

describe('two builds of the same handbook', () => {
  it('hold the same files, byte for byte (no timestamps, random ids or machine paths)', async () => {
    const [first, second] = outputs as [string, string];
    const files = await filesUnder(first);
    expect(files.length).toBeGreaterThan(3 * hostileSlugs.length);
    expect(await filesUnder(second)).toEqual(files);
    const differing: string[] = [];
    for (const file of files) {
      const [a, b] = await Promise.all([readFile(path.join(first, file)), readFile(path.join(second, file))]);
      if (!a.equals(b)) differing.push(file);
    }
    expect(differing).toEqual([]);
    const anyPage = await readFile(path.join(first, 'index.html'), 'utf8');
    expect(anyPage).not.toContain(root);
  });
});

describe('content cannot run in a reader’s browser or spreadsheet', () => {
  it('every built page parses to no element, event handler or URL from content that would run', async () => {
    const dist = outputs[0]!;
    // SVG files are parsed the same way: an SVG opened on its own runs its scripts and handlers.
    const pages = (await filesUnder(dist)).filter((file) => file.endsWith('.html') || file.endsWith('.svg'));
    expect(pages.length).toBeGreaterThan(hostileSlugs.length);
    const problems: string[] = [];
    for (const page of pages) for (const problem of activeContent(await readFile(path.join(dist, page), 'utf8'))) problems.push(`${page}: ${problem}`);
    expect(problems).toEqual([]);
  });

  it('the payloads reach the pages as text (so the check above looked at them)', async () => {
    const dist = outputs[0]!;
    for (const [index, payload] of TEXT_PAYLOADS.entries()) {
      const document = parse(await readFile(path.join(dist, 'correlations', `hostile-${index}`, 'index.html'), 'utf8')) as unknown as Node;
      const text = textOf(document);
      expect(text, `hostile-${index}`).toContain(`${payload} title ${index}`);
      expect(text, `hostile-${index}`).toContain(`${payload} material`);
      // Rows built ahead as HTML with the downloads (src/components/lib/pageHtml.ts): a data row's note, the statistics' unit.
      expect(text, `hostile-${index}`).toContain(`${payload} note 5`);
      expect(text, `hostile-${index}`).toContain(`largest |residual| (${payload} unit)`);
      const svgPath = path.join(dist, 'correlations', `hostile-${index}`, 'plot.svg');
      if (existsSync(svgPath)) expect(textOf(parse(await readFile(svgPath, 'utf8')) as unknown as Node), `hostile-${index} plot.svg`).toContain(`${payload} property`);
      const catalogue = textOf(parse(await readFile(path.join(dist, 'index.html'), 'utf8')) as unknown as Node);
      expect(catalogue).toContain(`${payload} title ${index}`);
    }
  });

  it('a checker that finds active content does find it (the checker itself can fail)', () => {
    expect(activeContent(`<p><img src=x onerror="alert('${MARKER}')"></p>`).length).toBeGreaterThan(0);
    expect(activeContent(`<a href=" java\tscript:alert(1)">x</a>`).length).toBeGreaterThan(0);
    expect(activeContent(`<script type="application/json">{"a":"</script><script>alert('${MARKER}')</script>`).length).toBeGreaterThan(0);
    expect(activeContent('<p>&lt;script&gt;PWNED</p>')).toEqual([]);
  });

  it('the CSV downloads hold no cell a spreadsheet would read as a formula (OWASP CSV injection: = + - @ tab CR)', async () => {
    const dist = outputs[0]!;
    const files = (await filesUnder(dist)).filter((file) => file.endsWith('.csv') && hostileSlugs.some((slug) => file.includes(`/${slug}/`)));
    expect(files.length).toBeGreaterThanOrEqual(hostileSlugs.length);
    for (const file of files) {
      const text = await readFile(path.join(dist, file), 'utf8');
      expect(text, file).toContain(MARKER);
      for (const line of text.trimEnd().split('\n')) {
        for (const cell of line.split(',')) {
          const opened = cell.replace(/^[ ]*"?[ ]*/, '');
          const isNumber = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*"?$/.test(cell);
          if (!isNumber) expect(opened, `${file}: ${line}`).not.toMatch(/^[=+\-@\t\r]/);
        }
      }
    }
  });
});
