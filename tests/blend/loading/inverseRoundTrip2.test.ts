/**
 * Property (round trip), part 2 of 2: forward loading model → inverse → forward reproduces the
 * mix for 5,000 random mixes of 1–5 phosphors over 0.05–2 mm (no re-absorption); the two
 * parts together cover 10,000 mixes. Beer–Lambert photon budget both ways.
 */
import { describe, it } from 'vitest';
import { assertRoundTrip } from './roundTripArbitraries';

describe('forward → inverse → forward (Beer–Lambert photon budget), part 2', () => {
  it('reproduces 5,000 random mixes', () => assertRoundTrip(5_000, 16), 60_000);
});
