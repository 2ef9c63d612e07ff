import { describe, expect, it } from 'vitest';
import { lotStanding } from '../../../src/lib/batches/lot-standing';

const known = [
  { lotNumber: 'LL-2611-07', expiresOn: '2027-06-30' },
  { lotNumber: 'LL-2503-01', expiresOn: '2026-03-31' }
];

describe('whether a typed lot can be recorded', () => {
  it('takes a registered, current lot (spaces at the ends ignored) and any text on a line without a material', () => {
    expect(lotStanding(' LL-2611-07 ', 'YL-568', known, '2026-12-05')).toEqual({ kind: 'ok', lotNumber: 'LL-2611-07' });
    expect(lotStanding('PART-A-77', 'PART A', null, '2026-12-05')).toEqual({ kind: 'free' });
    expect(lotStanding('   ', 'YL-568', known, '2026-12-05')).toEqual({ kind: 'empty' });
  });

  it('refuses an unknown lot, naming the known ones, and an expired one, naming the date', () => {
    expect(lotStanding('LL-9999', 'YL-568', known, '2026-12-05')).toMatchObject({
      kind: 'unknown',
      message: '"LL-9999" is not a known lot of YL-568. Known lots: LL-2611-07, LL-2503-01.'
    });
    expect(lotStanding('LL-2503-01', 'YL-568', known, '2026-12-05')).toMatchObject({
      kind: 'expired',
      message: 'Lot LL-2503-01 of YL-568 expired on 2026-03-31; use a current lot or have it retested.'
    });
    // The expiry day itself is still usable.
    expect(lotStanding('LL-2503-01', 'YL-568', known, '2026-03-31').kind).toBe('ok');
    expect(lotStanding('X', 'YL-568', [], '2026-12-05')).toMatchObject({
      message: '"X" is not a known lot of YL-568. No lot of this material is registered yet.'
    });
  });
});
