/**
 * The HTTP proxy in front of the app instances of `npm run cluster` (http-proxy): round robin over
 * the instances whose /api/health answers 200 (checked every second, and at once when a request to
 * one fails to connect). An instance whose database node is down answers 503 there and is left out
 * until it is healthy again; with none healthy the proxy answers 503 itself.
 * Usage: node --import tsx scripts/cluster/proxy.ts <port> <backend-url> [<backend-url>…]
 */
import http from 'node:http';
import httpProxy from 'http-proxy';

const [portArg, ...backends] = process.argv.slice(2);
if (!portArg || backends.length === 0) {
  console.error('usage: proxy.ts <port> <backend-url>…');
  process.exit(2);
}
const healthy = new Map<string, boolean>(backends.map((b) => [b, false]));
let next = 0;

async function check(b: string): Promise<void> {
  const was = healthy.get(b);
  let ok: boolean;
  try {
    const r = await fetch(`${b}/api/health`, { signal: AbortSignal.timeout(2000) });
    ok = r.status === 200;
  } catch {
    ok = false;
  }
  healthy.set(b, ok);
  if (was !== ok) console.log(`[proxy] ${b} ${ok ? 'healthy' : 'left out (health check failed)'}`);
}
const checkAll = () => Promise.all(backends.map(check));
setInterval(checkAll, 1000).unref();

function pick(): string | null {
  const up = backends.filter((b) => healthy.get(b));
  if (up.length === 0) return null;
  next = (next + 1) % up.length;
  return up[next];
}

// Kept-alive upstream connections: a new TCP connection per request would cost more than the request.
const proxy = httpProxy.createProxyServer({ xfwd: true, agent: new http.Agent({ keepAlive: true, maxSockets: 128 }) });
proxy.on('error', (err, req, res) => {
  const target = (req as http.IncomingMessage & { target?: string }).target;
  if (target) void check(target);
  const out = res as http.ServerResponse;
  if (!out.headersSent) {
    out.writeHead(503, { 'content-type': 'application/json', 'retry-after': '2' });
    out.end(JSON.stringify({ error: 'The app instance did not answer; try again shortly.' }));
  }
});

const server = http.createServer((req, res) => {
  const target = pick();
  if (!target) {
    res.writeHead(503, { 'content-type': 'application/json', 'retry-after': '2' });
    res.end(JSON.stringify({ error: 'No app instance is healthy; try again shortly.' }));
    return;
  }
  (req as http.IncomingMessage & { target?: string }).target = target;
  proxy.web(req, res, { target });
});

await checkAll();
server.listen(Number(portArg), '127.0.0.1', () => console.log(`[proxy] 127.0.0.1:${portArg} → ${backends.join(', ')}`));
const stop = () => server.close(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
