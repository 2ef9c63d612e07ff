import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../../src/lib/formulations/canonical-json';

describe('canonical JSON for content hashes', () => {
  it('sorts keys at every level and drops undefined, so equal content gives equal text (hand-worked)', () => {
    const a = { b: 1, a: { d: [3, { z: true, y: null }], c: 'x' }, u: undefined };
    const b = { a: { c: 'x', d: [3, { y: null, z: true }] }, b: 1 };
    expect(canonicalJson(a)).toBe('{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}');
    expect(canonicalJson(b)).toBe(canonicalJson(a));
  });

  it('writes non-finite numbers as null and keeps strings escaped', () => {
    expect(canonicalJson([Infinity, NaN, 'a"b'])).toBe('[null,null,"a\\"b"]');
  });

  it('hashes with SHA-256 as published (FIPS 180-2 appendix B.1: "abc")', () => {
    // FIPS PUB 180-2, Appendix B.1, one-block message "abc".
    expect(createHash('sha256').update('abc').digest('hex')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});
