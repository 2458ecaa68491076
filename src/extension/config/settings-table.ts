// Every `assay.*` setting, once: its default, how a value is checked, and what a change needs.
// package.json's `contributes.configuration` documents the same keys (a unit test keeps them equal).
import { ALL_RULES, DEFAULT_MISSING_TOKENS, DEFAULT_RULES, parseBinChoice } from '../../core/options';
import type { RuleId } from '../../core/options';

/** What a changed setting requires: a new profile, a new render of the same profile, or new diagnostics. */
export type ChangeNeed = 'reprofile' | 'render' | 'diagnostics';

export interface SettingSpec {
  key: string;
  default: unknown;
  /** Returns the checked value, or an error text `expected ...` when the value cannot be used. */
  check(v: unknown): { ok: true; value: unknown } | { ok: false; expected: string };
  need: ChangeNeed;
}

const ok = (value: unknown) => ({ ok: true as const, value });
const bad = (expected: string) => ({ ok: false as const, expected });

function number(min: number, max: number, integer: boolean, exclusiveMin = false) {
  return (v: unknown) => typeof v === 'number' && Number.isFinite(v) && (exclusiveMin ? v > min : v >= min) && v <= max && (!integer || Number.isInteger(v))
    ? ok(v)
    : bad(`${integer ? 'a whole number' : 'a number'} ${exclusiveMin ? 'above' : 'from'} ${min}${max === Infinity ? '' : ` to ${max}`}`);
}

function oneOf(values: readonly string[]) {
  return (v: unknown) => typeof v === 'string' && values.includes(v) ? ok(v) : bad(`one of ${values.join(', ')}`);
}

function stringList(v: unknown) {
  return Array.isArray(v) && v.every((x) => typeof x === 'string') ? ok([...v]) : bad('a list of strings');
}

function ruleList(v: unknown) {
  if (!Array.isArray(v)) return bad('a list of rule ids');
  const unknown = v.filter((x) => !ALL_RULES.includes(x as RuleId));
  return unknown.length === 0 ? ok([...new Set(v as RuleId[])]) : bad(`rule ids from: ${ALL_RULES.join(', ')} (unknown: ${unknown.join(', ')})`);
}

const BINS_EXPECTED = 'a bin rule (sqrt, sturges, rice, doane, scott, fd, auto), a number of bins from 1 to 10000, or width=W';

function bins(v: unknown) {
  if (typeof v !== 'string') return bad(BINS_EXPECTED);
  try {
    return ok(parseBinChoice(v));
  } catch {
    return bad(BINS_EXPECTED);
  }
}

function delimiter(v: unknown) {
  if (v === '' || v === null) return ok(null);
  if (v === '\\t' || v === 'tab') return ok('\t');
  return typeof v === 'string' && [...v].length === 1 ? ok(v) : bad('one character, "tab", or empty to detect');
}

const LEVELS = ['nominal', 'ordinal', 'interval', 'ratio'];

function levelMap(v: unknown) {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return bad('an object of column names to nominal, ordinal, interval or ratio');
  const entries = Object.entries(v as Record<string, unknown>);
  const wrong = entries.filter(([, l]) => typeof l !== 'string' || !LEVELS.includes(l));
  return wrong.length === 0 ? ok(Object.fromEntries(entries)) : bad(`levels from: ${LEVELS.join(', ')} (not: ${wrong.map(([k]) => k).join(', ')})`);
}

function text(v: unknown) {
  return typeof v === 'string' ? ok(v.trim()) : bad('a path, or empty');
}

export const SETTINGS: readonly SettingSpec[] = [
  { key: 'bins', default: 'fd', check: bins, need: 'reprofile' },
  { key: 'binEdges', default: 'nice', check: oneOf(['nice', 'exact']), need: 'reprofile' },
  { key: 'quantileType', default: 7, check: number(1, 9, true), need: 'reprofile' },
  { key: 'delimiter', default: '', check: delimiter, need: 'reprofile' },
  { key: 'missingTokens', default: [...DEFAULT_MISSING_TOKENS], check: stringList, need: 'reprofile' },
  { key: 'topN', default: 50, check: number(1, 100_000, true), need: 'reprofile' },
  { key: 'rules.enabled', default: [...DEFAULT_RULES], check: ruleList, need: 'reprofile' },
  { key: 'rules.tukeyK', default: 1.5, check: number(0, Infinity, false, true), need: 'reprofile' },
  { key: 'rules.tukeyFarK', default: 3, check: number(0, Infinity, false, true), need: 'reprofile' },
  { key: 'rules.modifiedZThreshold', default: 3.5, check: number(0, Infinity, false, true), need: 'reprofile' },
  { key: 'rules.zThreshold', default: 3, check: number(0, Infinity, false, true), need: 'reprofile' },
  { key: 'rules.grubbsAlpha', default: 0.05, check: number(0, 0.5, false, true), need: 'reprofile' },
  { key: 'rules.esdMaxOutliers', default: 10, check: number(1, 10_000, true), need: 'reprofile' },
  { key: 'rules.esdAlpha', default: 0.05, check: number(0, 0.5, false, true), need: 'reprofile' },
  { key: 'rules.nearConstantShare', default: 0.99, check: number(0, 1, false, true), need: 'reprofile' },
  { key: 'rules.maxFlagsPerRule', default: 1000, check: number(1, 1_000_000, true), need: 'reprofile' },
  { key: 'firstPass.aboveBytes', default: 10_485_760, check: number(0, Infinity, true), need: 'reprofile' },
  { key: 'firstPass.records', default: 10_000, check: number(100, 10_000_000, true), need: 'reprofile' },
  { key: 'largeFile.aboveBytes', default: 52_428_800, check: number(0, Infinity, true), need: 'reprofile' },
  { key: 'memoryLimitMB', default: 8192, check: number(0, 1_048_576, true), need: 'reprofile' },
  { key: 'exactValuesLimit', default: 50_000_000, check: number(1, 1_000_000_000, true), need: 'reprofile' },
  { key: 'diagnostics.max', default: 1000, check: number(0, 1_000_000, true), need: 'diagnostics' },
  { key: 'significantDigits', default: 4, check: number(1, 15, true), need: 'render' },
  { key: 'levels', default: {}, check: levelMap, need: 'reprofile' },
  { key: 'metadata.path', default: '', check: text, need: 'reprofile' },
];
