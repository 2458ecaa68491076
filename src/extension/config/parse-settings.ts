// Turns raw `assay.*` values into one frozen settings object: each value is checked against the
// settings table, a bad one is replaced by its default and reported, and the profile options are
// built with the core's resolveOptions. Pure (no `vscode`), so it is unit-tested directly.
import { OptionError, resolveOptions } from '../../core/options';
import type { BinChoice, ProfileOptions, RuleId } from '../../core/options';
import type { Level } from '../../core/profile/types';
import { toWireOptions } from '../../protocol/worker';
import type { WireOptions } from '../../protocol/worker';
import { SETTINGS } from './settings-table';
import type { ChangeNeed } from './settings-table';

export interface AssaySettings {
  /** The checked value of every key in the settings table. */
  readonly values: Readonly<Record<string, unknown>>;
  readonly options: ProfileOptions;
  readonly wire: WireOptions;
  readonly firstPassAboveBytes: number;
  readonly firstPassRecords: number;
  readonly largeFileAboveBytes: number;
  readonly maxDiagnostics: number;
  readonly significantDigits: number;
  /** A CSV on the Web metadata file to use (workspace-relative or absolute); '' looks beside each data file. */
  readonly metadataPath: string;
}

export interface ParsedSettings {
  settings: AssaySettings;
  /** One line per unusable value, in the project's error pattern, naming the default used instead. */
  problems: string[];
}

function show(v: unknown): string {
  const s = JSON.stringify(v);
  return s === undefined ? String(v) : s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

/** `get` returns the raw value of `assay.<key>` (undefined when unset). */
export function parseSettings(get: (key: string) => unknown): ParsedSettings {
  const problems: string[] = [];
  const values: Record<string, unknown> = {};
  for (const spec of SETTINGS) {
    const raw = get(spec.key);
    const fallback = spec.check(spec.default);
    const fallbackValue = fallback.ok ? fallback.value : spec.default;
    if (raw === undefined) { values[spec.key] = fallbackValue; continue; }
    const r = spec.check(raw);
    if (r.ok) values[spec.key] = r.value;
    else {
      values[spec.key] = fallbackValue;
      problems.push(`assay.${spec.key}: expected ${r.expected}, got ${show(raw)}; using ${show(spec.default)}`);
    }
  }
  const v = (key: string) => values[key];
  let options: ProfileOptions;
  try {
    options = resolveOptions({
      bins: v('bins') as BinChoice,
      edges: v('binEdges') as 'nice' | 'exact',
      quantileType: v('quantileType') as number,
      delimiter: v('delimiter') as string | null,
      missingTokens: v('missingTokens') as string[],
      topN: v('topN') as number,
      levels: v('levels') as Record<string, Level>,
      // 0: no ceiling.
      memoryLimitBytes: (v('memoryLimitMB') as number) === 0 ? null : (v('memoryLimitMB') as number) * 1024 * 1024,
      exactValuesLimit: v('exactValuesLimit') as number,
      rules: {
        enabled: v('rules.enabled') as RuleId[],
        tukeyK: v('rules.tukeyK') as number,
        tukeyFarK: v('rules.tukeyFarK') as number,
        modifiedZThreshold: v('rules.modifiedZThreshold') as number,
        zThreshold: v('rules.zThreshold') as number,
        grubbsAlpha: v('rules.grubbsAlpha') as number,
        esdMaxOutliers: v('rules.esdMaxOutliers') as number,
        esdAlpha: v('rules.esdAlpha') as number,
        nearConstantShare: v('rules.nearConstantShare') as number,
        maxFlagsPerRule: v('rules.maxFlagsPerRule') as number,
      },
    });
  } catch (e) {
    if (!(e instanceof OptionError)) throw e;
    problems.push(`assay: ${e.message}; using the default options`);
    options = resolveOptions({});
  }
  const settings: AssaySettings = Object.freeze({
    values: Object.freeze(values),
    options,
    wire: toWireOptions(options),
    firstPassAboveBytes: v('firstPass.aboveBytes') as number,
    firstPassRecords: v('firstPass.records') as number,
    largeFileAboveBytes: v('largeFile.aboveBytes') as number,
    maxDiagnostics: v('diagnostics.max') as number,
    significantDigits: v('significantDigits') as number,
    metadataPath: v('metadata.path') as string,
  });
  return { settings, problems };
}

/** What a change from `before` to `after` requires. */
export function changeNeeds(before: AssaySettings, after: AssaySettings): Set<ChangeNeed> {
  const needs = new Set<ChangeNeed>();
  for (const spec of SETTINGS) {
    if (JSON.stringify(before.values[spec.key]) !== JSON.stringify(after.values[spec.key])) needs.add(spec.need);
  }
  return needs;
}
