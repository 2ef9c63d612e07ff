import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { idParam } from '$lib/server/http/id-param';
import { getRevision, listSignatures } from '$lib/server/formulations/read';
import { buildRevisionRecord } from '$lib/server/pdf/revision-record';
import type { RequestHandler } from './$types';

/** The revision record as PDF: the signed content (with its recipe per chip bin), its hash and the signatures. */
export const GET: RequestHandler = async ({ locals, params }) => {
  requireUser(locals);
  const rev = await getRevision(idParam(params.revisionId, 'No such revision of this formulation.'));
  if (!rev || rev.formulationId !== idParam(params.id, 'No such revision of this formulation.'))
    error(404, 'No such revision of this formulation.');
  const pdf = await buildRevisionRecord(rev, await listSignatures(rev.id));
  const name = `${rev.formulationCode}-rev${rev.revisionNo}-record.pdf`.replace(/[^A-Za-z0-9._-]/g, '_');
  return new Response(new Uint8Array(pdf), {
    headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${name}"`, 'x-content-type-options': 'nosniff' }
  });
};
