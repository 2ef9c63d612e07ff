/** Extra app instances (node build) and a private MariaDB for fault and multi-instance tests. */
import { spawn, execFile, type ChildProcess } from 'node:child_process';
import { promisify } from 'node:util';

const run = promisify(execFile);

export interface AppInstance {
  url: string;
  /** Everything the instance wrote to stdout and stderr so far. */
  logs(): string;
  stop(): Promise<void>;
}

async function waitFor(url: string, ms = 30_000): Promise<void> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      const r = await fetch(url);
      if (r.status < 500 || r.status === 503) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`not up: ${url}`);
}

/** Starts `node build` on a port with extra environment (e.g. another database). */
export async function startApp(port: number, env: Record<string, string> = {}): Promise<AppInstance> {
  const url = `http://127.0.0.1:${port}`;
  const origin = env.ORIGIN ?? url;
  const child: ChildProcess = spawn('node', ['build'], {
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', ORIGIN: origin, ...env },
    stdio: ['ignore', 'pipe', 'pipe']
  });
  let stderr = '';
  let output = '';
  child.stderr?.on('data', (d) => {
    stderr += d;
    output += d;
  });
  child.stdout?.on('data', (d) => (output += d));
  try {
    await waitFor(`${url}/api/health`);
  } catch (e) {
    child.kill('SIGTERM');
    throw new Error(`${(e as Error).message}\n${stderr}`, { cause: e });
  }
  return {
    url,
    logs: () => output,
    stop: () =>
      new Promise<void>((ok) => {
        if (child.exitCode !== null) return ok();
        child.once('exit', () => ok());
        child.kill('SIGTERM');
      })
  };
}

/** A throwaway MariaDB server (scripts/db.sh with its own data directory and port). */
export function privateDb(dir: string, port: number, dbName: string) {
  const env = { ...process.env, PF_DB_DIR: dir, PF_DB_PORT: String(port), DB_NAME: dbName, PATH: `/usr/sbin:${process.env.PATH}` };
  const dbEnv = { DB_HOST: '127.0.0.1', DB_PORT: String(port), DB_NAME: dbName };
  return {
    env: dbEnv,
    start: () => run('bash', ['scripts/db.sh', 'start'], { env }),
    stop: () => run('bash', ['scripts/db.sh', 'stop'], { env }),
    migrateAndSeed: async () => {
      await run('npm', ['run', '--silent', 'db:migrate'], { env: { ...env, ...dbEnv } });
      await run('npm', ['run', '--silent', 'db:seed'], { env: { ...env, ...dbEnv } });
    }
  };
}
