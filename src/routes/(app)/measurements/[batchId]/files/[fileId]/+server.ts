import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { batchFile } from '$lib/server/quality/files';
import type { RequestHandler } from './$types';

/** A stored file of the batch: a raw measurement export or a batch record PDF. */
export const GET: RequestHandler = async ({ locals, params }) => {
  requireUser(locals);
  const file = await batchFile(Number(params.batchId), Number(params.fileId));
  if (!file) error(404, 'No such file for this batch.');
  return new Response(new Uint8Array(file.body), {
    headers: {
      'content-type': file.contentType,
      'content-disposition': `${file.contentType === 'application/pdf' ? 'inline' : 'attachment'}; filename="${file.name}"`,
      'cache-control': 'private, no-store'
    }
  });
};
