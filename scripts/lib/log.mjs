// Plain, prefixed progress lines so a newcomer can follow what set-up is doing.
export function step(msg) {
  process.stdout.write(`[holdfast] ${msg}\n`);
}
export function fail(msg) {
  process.stderr.write(`\n[holdfast] ERROR: ${msg}\n`);
  process.exit(1);
}
