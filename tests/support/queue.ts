// The test runs' job queues: emptied before a run (a recreated database restarts its ids), and
// the worker processes the tests start.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { createJobQueue } from "@/lib/jobs/queue";
import { TEST_REDIS_URL } from "./test-env";

const root = path.resolve(__dirname, "../..");

/** Removes every job of one queue prefix (waiting, running, finished) from the test Redis. */
export async function emptyQueue(prefix: string): Promise<void> {
  const queue = createJobQueue({ url: TEST_REDIS_URL, prefix });
  try {
    await queue.obliterate({ force: true });
  } finally {
    await queue.close();
  }
}

/**
 * Starts `npm run worker`'s command as a child process with the given environment and resolves
 * once it is taking jobs (it prints "platload worker <pid> on queue …").
 */
export function startWorkerProcess(
  env: Record<string, string>,
  { label = "worker", quiet = false } = {},
): Promise<ChildProcess> {
  const child = spawn(
    path.join(root, "node_modules/.bin/tsx"),
    ["--conditions=react-server", "scripts/worker.ts"],
    {
      cwd: root,
      env: { ...process.env, ...env },
      stdio: ["ignore", "pipe", "pipe"],
      // Its own process group, so a hard kill reaches the node process tsx starts, not tsx alone.
      detached: true,
    },
  );
  return new Promise((resolve, reject) => {
    let seen = "";
    const timer = setTimeout(() => reject(new Error(`${label} did not start within 60 s:\n${seen}`)), 60_000);
    child.stdout!.on("data", (chunk: Buffer) => {
      const text = chunk.toString();
      if (!quiet) process.stdout.write(`[${label}] ${text}`);
      seen += text;
      if (/platload worker \d+ on queue/.test(seen)) {
        clearTimeout(timer);
        resolve(child);
      }
    });
    child.stderr!.on("data", (chunk: Buffer) => {
      seen += chunk.toString();
      process.stderr.write(`[${label}] ${chunk.toString()}`);
    });
    child.on("exit", (code, signal) => {
      clearTimeout(timer);
      reject(new Error(`${label} exited (${code ?? signal}) before it started:\n${seen}`));
    });
  });
}

/** Kills a worker the tests started at once (SIGKILL to its process group), as a crash would. */
export async function killWorkerHard(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const gone = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  process.kill(-child.pid!, "SIGKILL");
  await gone;
}

/** Stops a worker process the tests started and waits for it to be gone (killed after 8 s). */
export async function stopWorkerProcess(
  child: ChildProcess,
  signal: NodeJS.Signals = "SIGTERM",
): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  await new Promise<void>((resolve) => {
    const timer = setTimeout(() => process.kill(-child.pid!, "SIGKILL"), 8000);
    child.once("exit", () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill(signal);
  });
}
