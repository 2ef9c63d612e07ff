/** Each caution only for the materials that carry it, from the material's own hazard data. */
import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { batchCautions } from '../../../src/lib/server/batches/cautions';
import { ensureDemoMaterials } from '../../support/demo-materials';

describe('weigh-out cautions of a batch', () => {
  afterAll(closeDb);

  it('print hydrogen fluoride only where a fluoride phosphor is weighed', async () => {
    const ids = await ensureDemoMaterials(db());
    const without = await batchCautions([{ materialId: ids.get('YL-568')! }, { materialId: ids.get('RD-625')! }, { materialId: null }]);
    expect(without.join(' ')).not.toMatch(/fluoride/i);
    expect(without[0]).toMatch(/respirable dusts/);
    const withFluoride = await batchCautions([{ materialId: ids.get('YL-568')! }, { materialId: ids.get('NR-631')! }]);
    expect(withFluoride.filter((c) => /hydrogen fluoride/.test(c))).toEqual([expect.stringMatching(/^NR-631: /)]);
  });
});
