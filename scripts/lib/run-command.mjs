import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { constants } from 'node:os';
import path from 'node:path';
import { repoRoot } from './repo-paths.mjs';

/** A bootstrap step that cannot go on; `exitCode` is what the script should exit with. */
export class StepError extends Error {
  constructor(message, exitCode = 1) {
    super(message);
    this.name = 'StepError';
    this.exitCode = exitCode;
  }
}

// Each running child and whether it sits in a process group of its own.
const runningChildren = new Map();

/**
 * Runs a program and resolves with its exit code (128 + n when signal n ended it),
 * plus its output when `capture` is set. Never rejects for a non-zero exit: callers
 * decide whether that is fatal.
 *
 * `detached` puts a long-running child (a server) in its own process group, so a
 * Ctrl-C in the terminal reaches it only through `forwardSignals` — exactly once,
 * instead of once from the terminal and again from whoever forwards it.
 */
export function runCommand(
  command,
  args,
  { cwd = repoRoot, env = process.env, capture = false, detached = false } = {},
) {
  return new Promise((resolve, reject) => {
    const stdio = capture
      ? ['ignore', 'pipe', 'pipe']
      : [detached ? 'ignore' : 'inherit', 'inherit', 'inherit'];
    const child = spawn(command, args, { cwd, env, stdio, detached });
    runningChildren.set(child, detached);
    let output = '';
    if (capture) {
      child.stdout.on('data', (chunk) => (output += chunk));
      child.stderr.on('data', (chunk) => (output += chunk));
    }
    child.on('error', (error) => {
      runningChildren.delete(child);
      reject(
        error.code === 'ENOENT'
          ? new StepError(`cannot run ${command}: it is not installed or not on PATH`, 127)
          : error,
      );
    });
    child.on('close', (code, signal) => {
      runningChildren.delete(child);
      resolve({ code: code ?? 128 + (constants.signals[signal] ?? 0), output });
    });
  });
}

/** Runs a program and throws a StepError saying `what` failed if it exits non-zero. */
export async function runChecked(what, command, args, options) {
  const { code, output } = await runCommand(command, args, options);
  if (code !== 0) {
    const detail = output.trim() ? `\n${output.trim()}` : '';
    throw new StepError(`${what} failed (exit code ${code})${detail}`, code);
  }
  return output;
}

/**
 * Path of a tool installed in the root node_modules. Running it directly rather than
 * through `npx` saves npm's start-up on every step and leaves no npm process between
 * a server and the signals meant for it.
 */
export function localBin(name) {
  const bin = path.join(repoRoot, 'node_modules', '.bin', name);
  if (!existsSync(bin)) {
    throw new StepError(
      `node_modules/.bin/${name} is missing: the dev dependencies are not installed (run npm ci)`,
    );
  }
  return bin;
}

const FORWARDED_SIGNALS = ['SIGINT', 'SIGTERM', 'SIGHUP'];
// npm forwards the terminal's Ctrl-C to us although we got it from the terminal already.
const REPEAT_WINDOW_MS = 1000;

/**
 * Passes SIGINT/SIGTERM/SIGHUP on to the children that would not get them otherwise
 * and tells `onSignal`, instead of letting Node exit at once and leave those children
 * (and any cleanup) behind.
 */
export function forwardSignals(onSignal = () => {}) {
  const lastSeen = new Map();
  for (const signal of FORWARDED_SIGNALS) {
    process.on(signal, () => {
      const now = Date.now();
      if (now - (lastSeen.get(signal) ?? 0) < REPEAT_WINDOW_MS) return;
      lastSeen.set(signal, now);
      for (const [child, detached] of runningChildren) {
        // Children in our own process group got a terminal's Ctrl-C or hang-up themselves.
        if (detached || signal === 'SIGTERM') child.kill(signal);
      }
      onSignal(signal);
    });
  }
}

export function signalExitCode(signal) {
  return 128 + (constants.signals[signal] ?? 0);
}

/** Sends `signal` to every child still running, e.g. the rest of a set once one has died. */
export function stopChildren(signal = 'SIGTERM') {
  for (const child of runningChildren.keys()) child.kill(signal);
}
