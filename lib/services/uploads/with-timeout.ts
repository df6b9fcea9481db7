/** Reject when p has not settled within ms (p itself is left to finish or fail on its own). */
export function withTimeout<T>(p: Promise<T>, ms: number, what = "the queue"): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer from ${what} within ${ms} ms`)), ms);
  });
  return Promise.race([p, timeout]).finally(() => clearTimeout(timer));
}
