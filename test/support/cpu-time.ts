/**
 * CPU time of this process (user + system, all its threads), for bounds a busy machine does not
 * blur: other processes on the same cores stretch wall time, not the CPU time this one uses.
 * Each test file runs in a worker process of its own (vitest's forks pool), one test at a time.
 */

/** Starts a CPU clock: the returned function gives the milliseconds of CPU time used since. */
export function cpuClock(): () => number {
  const start = process.cpuUsage();
  return () => {
    const used = process.cpuUsage(start);
    return (used.user + used.system) / 1000;
  };
}
