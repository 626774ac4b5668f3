// Preloaded into a command the bench runs (`node --import`): on exit, writes the process's own CPU
// time and peak resident memory to standard error as one marked line, for bench/cliCheck.ts to read.
process.on('exit', () => {
  const u = process.resourceUsage();
  process.stderr.write(
    `\nRUSAGE ${JSON.stringify({ userUs: u.userCPUTime, systemUs: u.systemCPUTime, maxRssKb: u.maxRSS })}\n`,
  );
});
