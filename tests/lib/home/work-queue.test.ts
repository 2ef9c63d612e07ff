import { describe, expect, it } from 'vitest';
import { queuesFor } from '../../../src/lib/home/work-queue';

describe('which queues a user sees', () => {
  it('joins the queues of several roles in role order, each once', () => {
    expect(queuesFor(['quality', 'formulator'])).toEqual([
      'drafts',
      'returnedRevisions',
      'correctionDrafts',
      'revisionsToReview',
      'batchesToDecide',
      'deviationsToAccept'
    ]);
    expect(queuesFor(['admin'])).toEqual([]);
  });
});
