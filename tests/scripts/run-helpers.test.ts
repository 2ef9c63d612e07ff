/**
 * The shared run helpers (scripts/processes.sh): a health wait that times out says what did not come
 * up and fails, and one list of build inputs decides for every script whether the build is stale.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

function bash(script: string, env: Record<string, string> = {}) {
  const options = { env: { ...process.env, ...env }, encoding: 'utf8' as const, timeout: 30_000 };
  return spawnSync('bash', ['-c', `. scripts/processes.sh; ${script}`], options);
}

describe('health waits', () => {
  it('fails with a message when the fakes never answer', () => {
    // Port 1 (tcpmux) has no listener on a development machine (common practice).
    const r = bash('wait_until "the fakes" 1 fakes_up', { PF_S3_PORT: '1', PF_SMTP_PORT: '1' });
    expect(r.status).not.toBe(0);
    expect(r.stderr).toContain('the fakes did not come up within 1 s');
  });

  it('returns at once when the check passes', () => {
    const r = bash('wait_until "always" 1 true');
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
  });
});

describe('build staleness', () => {
  it('is decided only by build_is_stale (one list of build inputs)', () => {
    const scripts = readdirSync('scripts').filter((f) => f.endsWith('.sh') && f !== 'processes.sh');
    for (const f of scripts) expect(readFileSync(`scripts/${f}`, 'utf8'), f).not.toMatch(/-newer|build\/index\.js/);
    const users = scripts.filter((f) => readFileSync(`scripts/${f}`, 'utf8').includes('build_is_stale'));
    expect(users.sort()).toEqual(['cluster.sh', 'load.sh', 'start.sh', 'test-cluster.sh']);
  });

  it('lists inputs that exist', () => {
    const r = bash('for f in "${BUILD_INPUTS[@]}"; do [ -e "$f" ] || echo "missing $f"; done');
    expect(r.stdout).toBe('');
  });
});
