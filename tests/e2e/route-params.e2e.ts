import { test, expect } from '@playwright/test';
import { DEMO, signedInContext } from './support/accounts';

// Every route parameter goes through the one id check: a malformed id is a 404, never a 500 from a
// query with NaN in it (the attachment route answered 500 "Unknown column 'NaN'").
const PATHS = [
  '/formulations/1/revisions/2/attachments/abc',
  '/formulations/1/revisions/abc',
  '/formulations/abc',
  '/formulations/1/revisions/-2/record',
  '/library/abc',
  '/library/1/files/1e3',
  '/batches/abc',
  '/measurements/0x10',
  '/measurements/1/files/NaN',
  '/library/packages/abc'
];

test('malformed ids in page and file routes answer 404', async () => {
  const ctx = await signedInContext(DEMO.admin);
  for (const path of PATHS) {
    const res = await ctx.get(path, { maxRedirects: 0 });
    expect(res.status(), path).toBe(404);
  }
  await ctx.dispose();
});
