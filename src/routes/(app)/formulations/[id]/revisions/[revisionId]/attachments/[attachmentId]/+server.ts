import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { idParam } from '$lib/server/http/id-param';
import { safeFileName } from '$lib/server/storage/objects';
import { getRevision } from '$lib/server/formulations/read';
import { attachmentFile } from '$lib/server/formulations/attachments';
import type { RequestHandler } from './$types';

/** Downloads one attachment of a revision. */
export const GET: RequestHandler = async ({ locals, params }) => {
  requireUser(locals);
  const rev = await getRevision(idParam(params.revisionId, 'No such revision of this formulation.'));
  if (!rev || rev.formulationId !== idParam(params.id, 'No such revision of this formulation.'))
    error(404, 'No such revision of this formulation.');
  const file = await attachmentFile(rev.id, idParam(params.attachmentId, 'No such attachment on this revision.'));
  if (!file) error(404, 'No such attachment on this revision.');
  return new Response(new Uint8Array(file.body), {
    headers: {
      'content-type': file.row.contentType,
      'content-disposition': `attachment; filename="${safeFileName(file.row.originalName)}"`,
      'x-content-type-options': 'nosniff'
    }
  });
};
