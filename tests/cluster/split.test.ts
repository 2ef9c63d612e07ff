/**
 * A network split, simulated by killing two of the three nodes: node 1 alone is a minority (no
 * primary component, Galera's quorum rule), refuses reads and writes, and the app on it answers 503;
 * after the heal (node 1 bootstrapped as the primary, the others rejoin) nothing written before the
 * split is lost, nothing refused during it appears, and the nodes agree again.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../src/lib/server/db/index';
import type { AppInstance } from '../e2e/support/instances';
import { api, appOnNode, everyNode, galera, tokenOf, unique, validContent } from './support';

let app: AppInstance;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
  app = await appOnNode(2, 1);
}, 120_000);
afterAll(async () => {
  await app?.stop();
  await closeDb();
});

async function clusterStatus(n: number): Promise<string> {
  return (await galera('sql', String(n), '-N', '-e', "SHOW STATUS LIKE 'wsrep_cluster_status'")).split('\t')[1]?.trim() ?? '';
}

describe('a minority node after a split', () => {
  it('refuses writes with 503 and loses or duplicates nothing after the heal', async () => {
    const call = api(app.url, await tokenOf('rhea.okafor@kestrelhollow.example'));
    const content = await validContent();
    const draft = (code: string) =>
      call('POST', '/api/v1/formulations', { code, name: 'Split test blend', content: { ...content, notes: code } });
    const before = unique('SP');
    expect((await draft(before)).status).toBe(201);

    await galera('kill', '2');
    await galera('kill', '3');
    for (let i = 0; i < 150 && (await clusterStatus(1)) === 'Primary'; i++) await sleep(200);
    expect(await clusterStatus(1)).toBe('non-Primary');
    const refused = unique('SP');
    const during = await draft(refused);
    expect(during.status).toBe(503);
    expect((await call('GET', '/api/v1/formulations?limit=5')).status).toBe(503);

    // Heal: node 1 holds every committed write, so it becomes the primary component; the others rejoin.
    await galera('sql', '1', '-e', "SET GLOBAL wsrep_provider_options='pc.bootstrap=YES'");
    await galera('start-node', '2');
    await galera('start-node', '3');
    await galera('wait-synced');
    const after = unique('SP');
    expect((await draft(after)).status).toBe(201);

    const { codesByNode, checksumsByNode } = await everyNode([before, refused, after]);
    for (const codes of codesByNode) expect(codes).toEqual([after, before].sort());
    expect(checksumsByNode[1]).toEqual(checksumsByNode[0]);
    expect(checksumsByNode[2]).toEqual(checksumsByNode[0]);
  }, 240_000);
});
