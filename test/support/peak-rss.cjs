// Preloaded into a child process (node --require): on exit, prints the process's peak resident
// set size and the CPU time it used, so a test can hold a run to a memory and a time bound that a
// busy machine does not blur. maxRSS is in kibibytes on Linux and macOS; CPU times in microseconds.
// On Linux the peak is read from /proc/self/status (VmHWM, this program's own memory): the
// kernel's maxRSS keeps the high-water mark the process had before exec, that of the test worker
// that forked it, so a child of a large worker would report the worker's size.
'use strict';
process.on('exit', () => {
  const fs = require('node:fs');
  const usage = process.resourceUsage();
  const cpuMs = Math.round((usage.userCPUTime + usage.systemCPUTime) / 1000);
  let kib = usage.maxRSS;
  try {
    const hwm = /^VmHWM:\s+(\d+) kB$/m.exec(fs.readFileSync('/proc/self/status', 'utf8'));
    if (hwm) kib = Number(hwm[1]);
  } catch {
    // No /proc (macOS): maxRSS is the figure there.
  }
  fs.writeSync(2, `\n@@peak-rss-kib ${kib} cpu-ms ${cpuMs}\n`);
});
