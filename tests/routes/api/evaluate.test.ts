import { describe, expect, it } from 'vitest';
import { POST } from '../../../src/routes/api/v1/evaluate/+server';
import { CIE_ILLUMINANTS_F, CIE_ILLUMINANT_A } from '../../../src/lib/spectral/data/cie-illuminants';
import { call, jsonEvent } from './support';

const spdOf = (t: { startNm: number; stepNm: number }, values: readonly number[]) => ({
  wavelengths: values.map((_, i) => t.startNm + i * t.stepNm),
  values: [...values]
});

describe('POST /api/v1/evaluate', () => {
  it('evaluates CIE illuminant A to its published white point', async () => {
    const { status, body } = await call(POST, jsonEvent({ spd: spdOf(CIE_ILLUMINANT_A, CIE_ILLUMINANT_A.values) }));
    expect(status).toBe(200);
    // CIE 15:2004 white point of illuminant A: x 0.44757, y 0.40745 (from memory); CCT 2856 K by definition.
    expect(body.x).toBeCloseTo(0.44757, 4);
    expect(body.y).toBeCloseTo(0.40745, 4);
    expect(Math.round(body.cct)).toBeGreaterThanOrEqual(2855);
    expect(Math.round(body.cct)).toBeLessThanOrEqual(2857);
    // A is a Planckian radiator, so CIE 13.3 Ra = 100 (common practice).
    expect(body.cri.ra).toBeGreaterThan(99.5);
    expect(body.tm30.bins).toHaveLength(16);
  });

  it('evaluates F12 to the published chromaticity and Ra', async () => {
    const { status, body } = await call(POST, jsonEvent({ spd: spdOf(CIE_ILLUMINANTS_F, CIE_ILLUMINANTS_F.series.F12) }));
    expect(status).toBe(200);
    // CIE 15:2004 F-illuminant table: F12 x 0.4370, y 0.4042; Ra 83 (from memory).
    expect(body.x).toBeCloseTo(0.437, 3);
    expect(body.y).toBeCloseTo(0.4042, 3);
    expect(Math.round(body.cri.ra)).toBe(83);
  });

  it('returns the α-opic metrics of CIE S 026 (illuminant A)', async () => {
    const { body } = await call(POST, jsonEvent({ spd: spdOf(CIE_ILLUMINANT_A, CIE_ILLUMINANT_A.values), options: { tm30: false } }));
    // Published CIE S 026 worked example: illuminant A at 100 lx has melanopic EDI 49.581 lx (DER 0.4958)
    expect(body.alphaOpic.der.melanopic).toBeCloseTo(0.4958, 2);
    expect(body.alphaOpic.melanopicEdiPer1000Lx).toBeCloseTo(1000 * body.alphaOpic.der.melanopic, 9);
    expect(Object.keys(body.alphaOpic.efficacyMwPerLm)).toEqual(['sCone', 'mCone', 'lCone', 'rhodopic', 'melanopic']);
  });

  it('skips TM-30 when asked', async () => {
    const { body } = await call(POST, jsonEvent({ spd: spdOf(CIE_ILLUMINANT_A, CIE_ILLUMINANT_A.values), options: { tm30: false } }));
    expect(body.tm30).toBeNull();
    expect(body.cri).not.toBeNull();
  });

  it('answers 400 with the failing field for a malformed body', async () => {
    const { status, body } = await call(POST, jsonEvent({ spd: { wavelengths: [400, 500], values: [1] } }));
    expect(status).toBe(400);
    expect(body.issues.some((i: { path: string }) => i.path.startsWith('spd'))).toBe(true);
  });

  it('answers 400 for text that is not JSON and 415 for another content type', async () => {
    expect((await call(POST, jsonEvent('{"spd":'))).status).toBe(400);
    expect((await call(POST, jsonEvent('{}', ['formulator'], { 'content-type': 'text/plain' }))).status).toBe(415);
  });

  it('answers 422 naming the problem for decreasing wavelengths', async () => {
    const spd = { wavelengths: [500, 490, 480, 470, 460, 450], values: [1, 1, 1, 1, 1, 1] };
    const { status, body } = await call(POST, jsonEvent({ spd }));
    expect(status).toBe(422);
    expect(body.error).toMatch(/increasing|wavelength/i);
  });

  it('answers 413 for a body over 2 MB', async () => {
    const big = JSON.stringify({ spd: { wavelengths: [1], values: [1] }, pad: 'x'.repeat(2 * 1024 * 1024 + 10) });
    expect((await call(POST, jsonEvent(big))).status).toBe(413);
  });

  it('refuses a signed-out caller', async () => {
    expect((await call(POST, jsonEvent({ spd: {} }, null))).status).toBe(401);
  });
});
