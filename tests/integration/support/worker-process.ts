/**
 * Starts real search worker processes (`scripts/worker.ts`) against the test database, the way
 * `npm run worker` does, so job tests exercise pg-boss, the worker and the piscina threads for real.
 */
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";

const TSX = path.join(process.cwd(), "node_modules", ".bin", "tsx");

export interface WorkerHandle {
  child: ChildProcess;
  output: () => string;
  stop: () => Promise<void>;
  kill: () => Promise<void>;
}

export function startWorker(name: string, env: Record<string, string> = {}): WorkerHandle {
  const child = spawn(TSX, ["scripts/worker.ts"], {
    cwd: process.cwd(),
    env: { ...process.env, WORKER_NAME: name, ...env },
    stdio: ["ignore", "pipe", "pipe"],
    // Its own process group: tsx runs node as a child, and a kill must reach both.
    detached: true,
  });
  let text = "";
  child.stdout?.on("data", (chunk: Buffer) => (text += chunk.toString()));
  child.stderr?.on("data", (chunk: Buffer) => (text += chunk.toString()));
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const signalGroup = (signal: NodeJS.Signals) => {
    try {
      if (child.pid) process.kill(-child.pid, signal);
    } catch {
      // already gone
    }
  };
  return {
    child,
    output: () => text,
    async stop() {
      if (child.exitCode === null) signalGroup("SIGTERM");
      await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
      if (child.exitCode === null) signalGroup("SIGKILL");
    },
    /** Dies at once, as a crashed machine would: no clean-up, the job stays active. */
    async kill() {
      signalGroup("SIGKILL");
      await exited;
    },
  };
}

export async function waitFor<T>(probe: () => Promise<T | null | undefined | false>, timeoutMs: number, what: string, everyMs = 50): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const value = await probe();
    if (value) return value;
    await new Promise((r) => setTimeout(r, everyMs));
  }
  throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}`);
}
