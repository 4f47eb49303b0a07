// Preloaded (`node --require`) into the bundles the benchmark runs: at exit, the process's own CPU
// time (user + system, microseconds) on standard error, so a loaded machine's waiting can be told
// apart from the work done.
process.on('exit', () => {
  const { user, system } = process.cpuUsage();
  process.stderr.write(`\nbench-cpu-us ${user + system}\n`);
});
