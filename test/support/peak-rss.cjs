// Preloaded into a child process (node --require): on exit, prints the process's peak resident
// set size and the CPU time it used, so a test can hold a run to a memory and a time bound that a
// busy machine does not blur. maxRSS is in kibibytes on Linux and macOS; CPU times in microseconds.
'use strict';
process.on('exit', () => {
  const usage = process.resourceUsage();
  const cpuMs = Math.round((usage.userCPUTime + usage.systemCPUTime) / 1000);
  require('node:fs').writeSync(2, `\n@@peak-rss-kib ${usage.maxRSS} cpu-ms ${cpuMs}\n`);
});
