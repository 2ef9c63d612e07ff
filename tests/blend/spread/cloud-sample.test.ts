/** The kept forecast sample: evenly spaced, at most `max` points, each with its chip bin; one bin's points picked by code. */
import { describe, expect, it } from 'vitest';
import { cloudSample, samplePointsOf } from '../../../src/lib/blend/spread/cloud-sample';

describe('cloudSample', () => {
  const x = Float64Array.from({ length: 10_000 }, (_, i) => 0.4 + i * 1e-7);
  const y = Float64Array.from({ length: 10_000 }, () => 0.4);
  it('keeps every k-th point up to the maximum, rounded to 5 decimals', () => {
    const s = cloudSample(x, y, null, 2000);
    expect(s.points).toHaveLength(2000);
    expect(s.points[1]).toEqual([0.4, 0.4]); // 0.4000005 → 0.4
    expect(s.bins).toBeNull();
  });
  it("keeps each bin's share of a pooled cloud and picks one bin case-blind", () => {
    const s = cloudSample(x, y, (i) => (i < 2500 ? 'B3' : 'B4'), 1000);
    expect(s.points).toHaveLength(1000);
    expect(samplePointsOf(s, 'b3')).toHaveLength(250);
    expect(samplePointsOf(s, 'B4')).toHaveLength(750);
    expect(samplePointsOf(s, null)).toHaveLength(1000);
  });
});
