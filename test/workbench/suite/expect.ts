// Minimal assertions for the workbench suite (Node's `assert` does not exist in the web host).
export class AssertionError extends Error {
  override name = 'AssertionError';
}

function show(v: unknown): string {
  try {
    return JSON.stringify(v) ?? String(v);
  } catch {
    return String(v);
  }
}

export function equal<T>(actual: T, expected: T, what: string): void {
  if (!Object.is(actual, expected)) throw new AssertionError(`${what}: expected ${show(expected)}, got ${show(actual)}`);
}

/** Structural equality through JSON (the values compared here are plain data). */
export function deepEqual(actual: unknown, expected: unknown, what: string): void {
  if (show(actual) !== show(expected)) throw new AssertionError(`${what}:\n  expected ${show(expected)}\n  got      ${show(actual)}`);
}

export function ok(value: unknown, what: string): asserts value {
  if (!value) throw new AssertionError(`${what}: expected a true value, got ${show(value)}`);
}
