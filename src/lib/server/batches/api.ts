/** Helpers of the batch endpoints: JSON and PDF views of records. */
import { json } from '@sveltejs/kit';
import type { BatchDetail } from './read';

/** The batch as the API returns it (revision content left out: GET it from the formulations API). */
export function batchJson(d: BatchDetail) {
  const { input, ...batch } = d.batch;
  return {
    ...batch,
    weighoutInput: input,
    revision: d.revision
      ? { id: d.revision.id, formulationCode: d.revision.formulationCode, revisionNo: d.revision.revisionNo, state: d.revision.state }
      : null,
    silicone: d.silicone,
    lines: d.lines
  };
}

export const pdfResponse = (pdf: Buffer, fileName: string, disposition: 'attachment' | 'inline' = 'attachment') =>
  new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `${disposition}; filename="${fileName}"`,
      'cache-control': 'no-store'
    }
  });

export { json };
