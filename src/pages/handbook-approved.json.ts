/**
 * `/handbook-approved.json`: the same layout as `/handbook.json` (and the same schema), listing only the
 * correlations whose approval holds: approved, with a recorded fingerprint equal to the current one. Lapsed,
 * unbound, withdrawn, draft and in-review correlations are left out. This is the file a design tool should consume.
 */
import type { APIRoute } from 'astro';
import { handbookExport } from '../components/lib/handbookExport.ts';
import { approvalHolds } from '../components/lib/reviewView.ts';

export const GET: APIRoute = async ({ site }) => {
  return new Response(await handbookExport(site, approvalHolds), { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
};
