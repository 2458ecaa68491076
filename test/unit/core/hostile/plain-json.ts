// Test helper (not a test): the project rule that core results are plain JSON (DEVELOPERS.md,
// "Practices"): only null, booleans, finite numbers, strings, arrays and plain objects, no
// `undefined` anywhere, no NaN or Infinity (JSON would turn them into null), no typed arrays.

/** Paths of every value in `value` that JSON would not carry unchanged; empty when it is plain. */
export function jsonProblems(value: unknown, path = '$', out: string[] = []): string[] {
  if (out.length >= 20) return out;
  if (value === null || typeof value === 'string' || typeof value === 'boolean') return out;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path}: ${value}`);
    return out;
  }
  if (Array.isArray(value)) {
    if (Object.keys(value).length !== value.length) out.push(`${path}: array with extra properties`);
    value.forEach((v, i) => jsonProblems(v, `${path}[${i}]`, out));
    return out;
  }
  if (typeof value === 'object') {
    const proto = Object.getPrototypeOf(value) as unknown;
    if (proto !== Object.prototype && proto !== null) {
      out.push(`${path}: instance of ${(value as object).constructor?.name ?? 'unknown'}`);
      return out;
    }
    for (const [k, v] of Object.entries(value)) jsonProblems(v, `${path}.${k}`, out);
    return out;
  }
  out.push(`${path}: ${typeof value}`);
  return out;
}
