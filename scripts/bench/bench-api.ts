/**
 * API throughput and latency on a signed-in list route: `npm run bench:api`.
 *
 * Uses the running local services and the seeded demo database (`npm start` prepares both), starts its own
 * API on a spare loopback port, signs in as the demo lab manager, drives GET /api/tunnels with autocannon
 * for a fixed time over loopback only, prints requests/s and p50/p95/p99 latency (from every response,
 * not autocannon's whole-millisecond histogram), then stops the API.
 *
 *   BENCH_DURATION (s, default 10)   BENCH_CONNECTIONS (default 10)   DATABASE_URL, REDIS_URL as for the API
 *
 * Goal on 2 cores: at least 500 requests/s with p95 at most 50 ms.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { availableParallelism, loadavg } from 'node:os';
import { resolve } from 'node:path';
import autocannon, { type AutocannonResult } from 'autocannon';
import { demoPassword, demoUsers } from '../seed/demo-users';

const repoRoot = resolve(import.meta.dirname, '../..');
const durationSeconds = Number(process.env.BENCH_DURATION ?? 10);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 10);
const route = '/api/tunnels';
const goal = { requestsPerSecond: 500, p95Ms: 50 };

/** Asks the kernel for a free loopback port. */
function sparePort(): Promise<number> {
  return new Promise((done, fail) => {
    const probe = createServer();
    probe.once('error', fail);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => done(port));
    });
  });
}

/** The value below which `fraction` of the sorted samples lie (nearest-rank method). */
function percentile(sorted: number[], fraction: number): number {
  if (sorted.length === 0) return Number.NaN;
  const rank = Math.ceil(fraction * sorted.length);
  return sorted[Math.min(sorted.length, Math.max(1, rank)) - 1];
}

/**
 * CPU time used so far by a process, in milliseconds (user + system, from /proc): with the load average
 * it tells a slow API from a busy machine.
 */
function cpuMilliseconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  // Fields 14 and 15 of /proc/<pid>/stat (utime, stime), in clock ticks of 10 ms on Linux.
  return (Number(fields[11]) + Number(fields[12])) * 10;
}

async function waitForHealth(baseUrl: string, api: ChildProcess, log: string[]): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (api.exitCode !== null) throw new Error(`the API exited with code ${api.exitCode}:\n${log.join('')}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
      if (response.status === 503) {
        throw new Error('the API answers 503: PostgreSQL or Redis is down. Start them with `bash scripts/services.sh start`.');
      }
    } catch (error) {
      if (error instanceof Error && error.message.startsWith('the API answers')) throw error;
    }
    await new Promise((done) => setTimeout(done, 250));
  }
  throw new Error(`the API did not become healthy within 60 s:\n${log.join('')}`);
}

async function signIn(baseUrl: string): Promise<string> {
  const manager = demoUsers.find((user) => user.role === 'lab_manager');
  if (!manager) throw new Error('the demo data has no lab manager');
  const response = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: manager.email, password: demoPassword }),
  });
  if (!response.ok) {
    throw new Error(`signing in as ${manager.email} failed with ${response.status}: seed the demo database first (npm start or npm run seed)`);
  }
  const body = (await response.json()) as { accessToken: string };
  return body.accessToken;
}

function runLoad(url: string, token: string, seconds: number, latencies: number[]): Promise<AutocannonResult> {
  return new Promise((done, fail) => {
    const instance = autocannon(
      { url, connections, duration: seconds, pipelining: 1, headers: { authorization: `Bearer ${token}` } },
      (error, result) => (error ? fail(error) : done(result)),
    );
    instance.on('response', (_client, statusCode, _bytes, responseTime) => {
      if (statusCode >= 200 && statusCode < 300) latencies.push(responseTime);
    });
  });
}

const port = await sparePort();
const baseUrl = `http://127.0.0.1:${port}`;
const apiLog: string[] = [];
const api = spawn('node', ['--import', 'tsx', 'apps/api/src/server.ts'], {
  cwd: repoRoot,
  env: {
    ...process.env,
    PORT: String(port),
    PUBLIC_URL: baseUrl,
    // Per-request access logs would measure the terminal, not the API.
    LOG_LEVEL: 'warn',
    DEMO_MODE: 'true',
  },
  stdio: ['ignore', 'pipe', 'pipe'],
});
api.stdout?.on('data', (chunk: Buffer) => apiLog.push(chunk.toString()));
api.stderr?.on('data', (chunk: Buffer) => apiLog.push(chunk.toString()));

try {
  await waitForHealth(baseUrl, api, apiLog);
  const token = await signIn(baseUrl);
  const probe = await fetch(`${baseUrl}${route}`, { headers: { authorization: `Bearer ${token}` } });
  const tunnels = (await probe.json()) as unknown[];
  console.log(`bench:api  GET ${route} as the demo lab manager (${tunnels.length} tunnels in the answer)`);
  console.log(`           ${connections} connections, ${durationSeconds} s, loopback port ${port}, ${process.env.DATABASE_URL ?? 'demo database'}`);

  // A short warm-up so the first figures do not include module compilation and cold caches.
  await runLoad(`${baseUrl}${route}`, token, 2, []);
  const latencies: number[] = [];
  const cpuBefore = api.pid ? cpuMilliseconds(api.pid) : Number.NaN;
  const result = await runLoad(`${baseUrl}${route}`, token, durationSeconds, latencies);
  const cpuUsed = api.pid ? cpuMilliseconds(api.pid) - cpuBefore : Number.NaN;
  latencies.sort((a, b) => a - b);

  const requestsPerSecond = latencies.length / result.duration;
  const p50 = percentile(latencies, 0.5);
  const p95 = percentile(latencies, 0.95);
  const p99 = percentile(latencies, 0.99);
  console.log('');
  console.log(`requests            ${latencies.length} ok, ${result.non2xx} not 2xx, ${result.errors} errors, ${result.timeouts} timeouts`);
  console.log(`requests/s          ${requestsPerSecond.toFixed(0)}   (goal ≥ ${goal.requestsPerSecond})`);
  console.log(`latency p50         ${p50.toFixed(2)} ms`);
  console.log(`latency p95         ${p95.toFixed(2)} ms   (goal ≤ ${goal.p95Ms} ms)`);
  console.log(`latency p99         ${p99.toFixed(2)} ms`);
  const cpuPerRequest = cpuUsed / latencies.length;
  console.log(`API CPU / request   ${cpuPerRequest.toFixed(2)} ms   (one core could serve about ${(1000 / cpuPerRequest).toFixed(0)} requests/s)`);
  console.log(`load average        ${loadavg().map((value) => value.toFixed(2)).join(' ')} (1, 5, 15 min) on ${availableParallelism()} cores`);
  const met = requestsPerSecond >= goal.requestsPerSecond && p95 <= goal.p95Ms && result.non2xx === 0 && result.errors === 0;
  console.log(`goal                ${met ? 'met' : 'NOT met'}`);
} finally {
  const exited = new Promise((done) => api.once('exit', done));
  api.kill('SIGTERM');
  const timer = setTimeout(() => api.kill('SIGKILL'), 10_000);
  await exited;
  clearTimeout(timer);
}
