/**
 * `/handbook.json`: every fitted correlation of the handbook as one machine-readable file (src/export/handbookJson.ts),
 * described by `/handbook.schema.json`. Each carries its status, fingerprint and approval (whether it holds).
 */
import type { APIRoute } from 'astro';
import { handbookExport } from '../components/lib/handbookExport.ts';

export const GET: APIRoute = async ({ site }) => {
  return new Response(await handbookExport(site), { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
};
