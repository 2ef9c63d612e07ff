import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { idParam } from '$lib/server/http/id-param';
import { batchFile } from '$lib/server/measurements/files';
import type { RequestHandler } from './$types';

/** A stored file of the batch: a raw measurement export or a batch record PDF. */
export const GET: RequestHandler = async ({ locals, params }) => {
  requireUser(locals);
  const file = await batchFile(
    idParam(params.batchId, 'No such file for this batch.'),
    idParam(params.fileId, 'No such file for this batch.')
  );
  if (!file) error(404, 'No such file for this batch.');
  return new Response(new Uint8Array(file.body), {
    headers: {
      'content-type': file.contentType,
      'content-disposition': `${file.contentType === 'application/pdf' ? 'inline' : 'attachment'}; filename="${file.name}"`,
      'cache-control': 'private, no-store'
    }
  });
};
