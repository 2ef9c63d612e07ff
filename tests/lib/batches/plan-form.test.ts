/** The plan form's chip-lot fields and empty loadings → the create request (pure). */
import { describe, expect, it } from 'vitest';
import { defaultFields, fieldsToRequest } from '../../../src/lib/batches/plan-form';
import { createBatchSchema } from '../../../src/lib/batches/schema';

const fields = (over: Record<string, string>) => ({ ...defaultFields(7, 2, null), ...over });

describe('plan form → request', () => {
  it('empty loadings mean the revision’s own (the chip bin’s recipe with a matrix)', () => {
    const req = createBatchSchema.parse(fieldsToRequest(fields({}), 2));
    expect(req.loading).toEqual({ mode: 'perPhosphor', basis: 'wtPctOfSlurry', pcts: undefined });
    expect(req.chipLot).toBeNull();
  });

  it('reads the chip lot with its bin code or its wavelength (decimal comma accepted)', () => {
    const byCode = createBatchSchema.parse(fieldsToRequest(fields({ chipLot: ' KH-CHIP-7 ', chipBinCode: 'B2' }), 2));
    expect(byCode.chipLot).toEqual({ lotNumber: 'KH-CHIP-7', binCode: 'B2', wavelengthNm: undefined });
    const byNm = createBatchSchema.parse(fieldsToRequest(fields({ chipLot: 'KH-CHIP-8', chipWavelengthNm: '451,3' }), 2));
    expect(byNm.chipLot).toEqual({ lotNumber: 'KH-CHIP-8', binCode: undefined, wavelengthNm: 451.3 });
  });

  it('a wavelength without a lot number names the missing lot', () => {
    const r = createBatchSchema.safeParse(fieldsToRequest(fields({ chipWavelengthNm: '451' }), 2));
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.message)).toContain('enter the chip lot number');
  });
});
