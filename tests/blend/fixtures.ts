/** Shared fixtures of the blend tests: invented demo components (src/lib/blend/demo-components.ts). */
import { BLUE_PUMP, VIOLET_PUMP, demoPhosphor } from '../../src/lib/blend/demo-components';
import type { BlendComponents } from '../../src/lib/blend/types';

export const blue = (...ids: string[]): BlendComponents => ({ pump: BLUE_PUMP, phosphors: ids.map(demoPhosphor) });
export const violet = (...ids: string[]): BlendComponents => ({ pump: VIOLET_PUMP, phosphors: ids.map(demoPhosphor) });

/** Green + yellow-green + red: the classic high-CRI warm-white set. */
export const THREE = blue('ph-gl530', 'ph-yg555', 'ph-rd625');
export const FOUR = blue('ph-gl530', 'ph-yg555', 'ph-rd625', 'ph-rd650');
