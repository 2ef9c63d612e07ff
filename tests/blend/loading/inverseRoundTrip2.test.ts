/**
 * Property (round trip), part 2 of 4: forward loading model → inverse → forward reproduces the
 * mix for 2,500 random mixes of 1–5 phosphors over 0.05–2 mm (no re-absorption); the four
 * parts together cover 10,000 mixes. Beer–Lambert photon budget both ways.
 */
import { describe, it } from 'vitest';
import { assertRoundTrip } from './roundTripArbitraries';

describe('forward → inverse → forward (Beer–Lambert photon budget), part 2', () => {
  it('reproduces 2,500 random mixes', () => assertRoundTrip(2_500, 16), 180_000);
});
