const POLL_MS = 250;
const GIVE_UP_MS = 60_000;

/**
 * Polls `url` until it answers 200. Resolves true then, false after a minute without,
 * or null as soon as `exited` (the server's run) settles — a server that died has
 * already said why.
 */
export async function waitForHealth(url, exited) {
  let gone = false;
  exited.then(
    () => (gone = true),
    () => (gone = true),
  );
  const deadline = Date.now() + GIVE_UP_MS;
  while (Date.now() < deadline) {
    if (gone) return null;
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(2000) });
      if (response.status === 200) return true;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, POLL_MS));
  }
  return gone ? null : false;
}
