/**
 * The handbook's settings (title, organisation, address, base path, notice) as the pages read them: the one entry
 * of the `handbook` collection, which src/loaders/handbookSettingsLoader.ts fills from `handbook.yaml`.
 */
import { getEntry } from 'astro:content';
import { handbookSettingsSchema, type HandbookSettings } from '../../schema/handbookSettings.ts';

export type { HandbookSettings };

/** @example (await handbookSettings()).title // => "Correlary handbook" when the content has no settings file */
export async function handbookSettings(): Promise<HandbookSettings> {
  const entry = await getEntry('handbook', 'settings');
  return entry === undefined ? handbookSettingsSchema.parse({}) : entry.data;
}
