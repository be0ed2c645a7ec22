// Loaded with `node --import` ahead of a command: on exit it writes the
// process's CPU time (user and system, every thread's, ended ones included)
// as the last line of stderr, so a whole-process bench can read it on any
// system.
process.on('exit', () => {
  const u = process.cpuUsage();
  process.stderr.write(`\ncpu-us ${u.user + u.system}\n`);
});
