// Preloaded into a child process (node --require): on exit, prints the process's peak resident
// set size so a test can hold a run to a memory bound. maxRSS is in kibibytes on Linux and macOS.
'use strict';
process.on('exit', () => {
  require('node:fs').writeSync(2, `\n@@peak-rss-kib ${process.resourceUsage().maxRSS}\n`);
});
