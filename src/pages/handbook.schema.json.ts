/** `/handbook.schema.json`: the JSON Schema of `/handbook.json` (src/export/handbookSchema.ts). */
import type { APIRoute } from 'astro';
import { HANDBOOK_SCHEMA } from '../export/index.ts';

export const GET: APIRoute = () =>
  new Response(`${JSON.stringify(HANDBOOK_SCHEMA, null, 2)}\n`, { headers: { 'Content-Type': 'application/schema+json; charset=utf-8' } });
