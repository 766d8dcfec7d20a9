/**
 * `/handbook.json`: every fitted correlation of the handbook as one machine-readable file (src/export/handbookJson.ts),
 * described by `/handbook.schema.json`. Each carries its status, fingerprint and approval (whether it holds).
 */
import type { APIRoute } from 'astro';
import { handbookExport } from '../components/lib/handbookExport.ts';

export const GET: APIRoute = async ({ site }) => {
  const json = await handbookExport(site);
  return new Response(`${JSON.stringify(json, null, 2)}\n`, { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
};
