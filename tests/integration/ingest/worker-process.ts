// Start and stop real worker processes (`node --import tsx workers/index.ts`), as
// production runs them, for the crash and concurrency tests.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";

const ROOT = path.resolve(__dirname, "../../..");

export interface WorkerProcess {
  child: ChildProcess;
  output: () => string;
  stop: () => Promise<void>;
  kill9: () => Promise<void>;
}

export async function startWorker(env: Record<string, string> = {}): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", "workers/index.ts"], {
    cwd: ROOT,
    env: { ...process.env, ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let out = "";
  child.stdout?.on("data", (d) => (out += d));
  child.stderr?.on("data", (d) => (out += d));
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  await new Promise<void>((resolve, reject) => {
    const t = setTimeout(() => reject(new Error(`worker did not start:\n${out}`)), 30_000);
    const check = () => {
      if (out.includes("[worker] up")) { clearTimeout(t); resolve(); }
    };
    child.stdout?.on("data", check);
    child.once("exit", (code) => { clearTimeout(t); reject(new Error(`worker exited (${code}):\n${out}`)); });
  });
  return {
    child,
    output: () => out,
    stop: async () => {
      if (child.exitCode === null) child.kill("SIGTERM");
      await exited;
    },
    kill9: async () => {
      if (child.exitCode === null) child.kill("SIGKILL");
      await exited;
    },
  };
}

export async function waitFor<T>(what: string, probe: () => Promise<T | null | undefined | false>, timeoutMs = 120_000, everyMs = 200): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const v = await probe();
    if (v) return v;
    if (Date.now() > until) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, everyMs));
  }
}
