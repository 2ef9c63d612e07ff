import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayRead } from '$lib/access/policies';
import { fileOfMaterial } from '$lib/server/library/attachments';
import { getFile, safeFileName } from '$lib/server/storage/objects';
import { idParam } from '$lib/server/http/id-param';
import type { RequestHandler } from './$types';

/** Download of a material's stored file (data sheet, certificate, original spectrum export). */
export const GET: RequestHandler = async ({ locals, params }) => {
  requireUser(locals, mayRead);
  const row = await fileOfMaterial(
    idParam(params.id, 'No such file on this material.'),
    idParam(params.fileId, 'No such file on this material.')
  );
  if (!row) error(404, 'No such file on this material.');
  const file = await getFile(row.id);
  if (!file) error(404, 'No such file.');
  const pdf = file.row.contentType === 'application/pdf';
  return new Response(new Uint8Array(file.body), {
    headers: {
      'content-type': pdf ? 'application/pdf' : 'text/plain; charset=utf-8',
      'content-disposition': `attachment; filename="${safeFileName(file.row.originalName)}"`,
      'content-length': String(file.body.length),
      'x-content-type-options': 'nosniff',
      'cache-control': 'private, no-store'
    }
  });
};
