// One voice for the bootstrap scripts, so their lines stand apart from the
// output of the tools they run.

export function say(message) {
  console.log(`[railyard] ${message}`);
}

export function warn(message) {
  console.error(`[railyard] warning: ${message}`);
}

export function complain(message) {
  console.error(`[railyard] error: ${message}`);
}

export function seconds(sinceMs) {
  return `${((performance.now() - sinceMs) / 1000).toFixed(1)} s`;
}
