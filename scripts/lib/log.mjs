// Bootstrap messages: short, prefixed, on stderr so test summaries on stdout stay clean.
export const say = (message) => process.stderr.write(`[seamwright] ${message}\n`);

export function fail(message) {
  say(message);
  process.exit(1);
}
