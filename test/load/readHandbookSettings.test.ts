/**
 * readHandbookSettings: the handbook settings file at the content root (content/README.md, "Handbook settings").
 * Expected values are the documented defaults and the values written into each temporary file here.
 */
import { mkdtemp, rm, writeFile, cp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { contentDirectory, formatDiagnostic, readHandbook, readHandbookSettings } from '../../src/load/index.ts';

const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

async function handbookWith(settings: string | undefined): Promise<string> {
  const directory = await mkdtemp(path.join(tmpdir(), 'correlary-settings-'));
  temporary.push(directory);
  await cp('test/fixtures/content/valid/liquid-a', path.join(directory, 'liquid-a'), { recursive: true });
  if (settings !== undefined) await writeFile(path.join(directory, 'handbook.yaml'), settings);
  return directory;
}

describe('readHandbookSettings(directory)', () => {
  it('readHandbookSettings without a file gives the documented defaults and no message', async () => {
    const result = await readHandbookSettings(await handbookWith(undefined));
    expect(result.found).toBe(false);
    expect(result.diagnostics).toEqual([]);
    expect(result.settings).toEqual({ title: 'Correlary handbook', url: 'http://localhost:4321', basePath: '/' });
  });

  it('readHandbookSettings reads every key; an empty file is the defaults', async () => {
    const full = await readHandbookSettings(
      await handbookWith('title: Thermal Design Handbook\norganisation: Example Thermal Group\nurl: https://hb.example.org\nbasePath: /a/b-c/\nnotice: Internal use only.\n'),
    );
    expect(full.diagnostics).toEqual([]);
    expect(full.settings).toEqual({ title: 'Thermal Design Handbook', organisation: 'Example Thermal Group', url: 'https://hb.example.org', basePath: '/a/b-c/', notice: 'Internal use only.' });
    const empty = await readHandbookSettings(await handbookWith('# nothing set yet\n'));
    expect(empty.settings?.title).toBe('Correlary handbook');
  });

  it('readHandbookSettings refuses a base path that climbs out and a list instead of keys, with line and column', async () => {
    const climbing = await handbookWith('title: T\nbasePath: /a/../b/\n');
    expect((await readHandbookSettings(climbing)).diagnostics.map(formatDiagnostic)).toEqual([
      `${climbing}/handbook.yaml:2:11: 'basePath' may hold only letters, digits and - . _ ~ between the slashes, e.g. /thermal/handbook/`,
    ]);
    const list = await handbookWith('- title\n');
    expect((await readHandbookSettings(list)).diagnostics.map(formatDiagnostic)[0]).toMatch(/handbook\.yaml:1:1: handbook settings must be a block of keys/);
  });

  it('readHandbook(directory) reads handbook.yaml as settings, never as a correlation folder', async () => {
    const directory = await handbookWith('title: T\n');
    const handbook = await readHandbook(directory);
    expect(handbook.datasets.map((dataset) => dataset.slug)).toEqual(['liquid-a']);
    expect(handbook.settings.settings?.title).toBe('T');
    expect(handbook.diagnostics).toEqual([]);
  });
});

describe('contentDirectory(environment)', () => {
  it('contentDirectory is content unless CORRELARY_CONTENT names another', () => {
    expect(contentDirectory({})).toBe('content');
    expect(contentDirectory({ CORRELARY_CONTENT: '  ' })).toBe('content');
    expect(contentDirectory({ CORRELARY_CONTENT: '/srv/handbook' })).toBe('/srv/handbook');
  });
});
