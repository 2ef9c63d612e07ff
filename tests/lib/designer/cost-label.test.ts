import { describe, expect, it } from 'vitest';
import { costLabel } from '../../../src/lib/designer/cost-label';

describe('cost of a blend as shown', () => {
  it('names the currency and the basis of the loading-model cost, at four significant figures', () => {
    expect(costLabel(0.0031274, 'loadingModel', 'EUR')).toBe("EUR 0.003127 per 1,000 lm of this package's light");
    expect(costLabel(12.3456, 'loadingModel', 'USD')).toBe("USD 12.35 per 1,000 lm of this package's light");
  });

  it('shows the thin-layer proxy as relative, without a currency, and a missing price as such', () => {
    expect(costLabel(0.42, 'thinLayerProxy', 'EUR')).toBe('0.42 (relative; compare proposals only)');
    expect(costLabel(null, 'loadingModel', 'EUR')).toBe('no price');
  });
});
