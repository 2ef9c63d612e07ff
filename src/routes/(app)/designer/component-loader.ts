/** Fetches library components for the live loop (GET /api/v1/blend-components), once per set. */
import type { BlendComponents } from '$lib/blend';
import { componentQueryString } from '$lib/designer/component-query';

const cache = new Map<string, Promise<BlendComponents>>();

export function componentSetKey(pumpId: number, phosphorIds: readonly number[]): string {
  return componentQueryString(pumpId, phosphorIds);
}

export function loadComponents(pumpId: number, phosphorIds: readonly number[]): Promise<BlendComponents> {
  const key = componentSetKey(pumpId, phosphorIds);
  let hit = cache.get(key);
  if (!hit) {
    hit = fetch(`/api/v1/blend-components?${key}`, { headers: { accept: 'application/json' } }).then(async (res) => {
      const body = await res.json().catch(() => null);
      if (!res.ok) throw new Error(body?.error ?? `The library answered ${res.status}.`);
      return body as BlendComponents;
    });
    hit.catch(() => cache.delete(key));
    cache.set(key, hit);
  }
  return hit;
}
