// Settings: defaults give the core's default options, each bad value is replaced by its default with
// one message in the project's error pattern, changes are classified, and package.json documents
// exactly the keys and defaults of the settings table.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEFAULT_MISSING_TOKENS, DEFAULT_RULES, resolveOptions } from '../../../../src/core/options';
import { changeNeeds, parseSettings } from '../../../../src/extension/config/parse-settings';
import { SETTINGS } from '../../../../src/extension/config/settings-table';

const pkg = JSON.parse(readFileSync(join(__dirname, '../../../../package.json'), 'utf8')) as {
  contributes: { configuration: { properties: Record<string, { default: unknown; description?: string; markdownDescription?: string }> } };
};
const parse = (values: Record<string, unknown>) => parseSettings((k) => values[k]);

describe('parseSettings', () => {
  it('with nothing set gives the core\'s defaults, frozen, and no problems', () => {
    const { settings, problems } = parse({});
    expect(problems).toEqual([]);
    const d = resolveOptions({});
    expect(settings.options.bins).toEqual(d.bins);
    expect(settings.options.quantileType).toBe(7);
    expect(settings.options.missingTokens).toEqual(DEFAULT_MISSING_TOKENS);
    expect([...settings.options.rules.enabled].sort()).toEqual([...DEFAULT_RULES].sort());
    expect(settings.significantDigits).toBe(4);
    expect(settings.maxDiagnostics).toBe(1000);
    expect(Object.isFrozen(settings)).toBe(true);
    expect(Object.isFrozen(settings.options)).toBe(true);
    expect(JSON.parse(JSON.stringify(settings.wire))).toEqual(settings.wire);
  });

  it('takes valid values through to the options', () => {
    const { settings, problems } = parse({
      bins: 'width=2.5', binEdges: 'exact', quantileType: 6, delimiter: 'tab', missingTokens: ['NA'], topN: 10,
      'rules.enabled': ['grubbs', 'tukey-fence'], 'rules.tukeyK': 3, 'firstPass.aboveBytes': 0, significantDigits: 6,
    });
    expect(problems).toEqual([]);
    expect(settings.options.bins).toEqual({ rule: 'width', width: 2.5 });
    expect(settings.options.edges).toBe('exact');
    expect(settings.options.quantileType).toBe(6);
    expect(settings.options.delimiter).toBe('\t');
    expect(settings.options.missingTokens).toEqual(['NA']);
    expect(settings.options.topN).toBe(10);
    expect([...settings.options.rules.enabled].sort()).toEqual(['grubbs', 'tukey-fence']);
    expect(settings.options.rules.tukeyK).toBe(3);
    expect(settings.firstPassAboveBytes).toBe(0);
    expect(settings.significantDigits).toBe(6);
  });

  it.each([
    ['bins', 'seventeen', 'assay.bins: expected a bin rule (sqrt, sturges, rice, doane, scott, fd, auto), a number of bins from 1 to 10000, or width=W, got "seventeen"; using "fd"'],
    ['quantileType', 10, 'assay.quantileType: expected a whole number from 1 to 9, got 10; using 7'],
    ['topN', -3, 'assay.topN: expected a whole number from 1 to 100000, got -3; using 50'],
    ['rules.tukeyK', 0, 'assay.rules.tukeyK: expected a number above 0, got 0; using 1.5'],
    ['binEdges', 'round', 'assay.binEdges: expected one of nice, exact, got "round"; using "nice"'],
    ['delimiter', ';;', 'assay.delimiter: expected one character, "tab", or empty to detect, got ";;"; using ""'],
    ['missingTokens', 'NA', 'assay.missingTokens: expected a list of strings, got "NA"; using ["","NA","N/A","n/a","na","null","NULL","Null","NaN","nan...'],
  ])('a bad %s is reported and replaced by its default', (key, value, message) => {
    const { settings, problems } = parse({ [key]: value });
    expect(problems).toEqual([message]);
    const spec = SETTINGS.find((x) => x.key === key)!;
    const fallback = spec.check(spec.default);
    expect(fallback.ok && settings.values[key]).toEqual(fallback.ok && fallback.value);
  });

  it('turns assay.memoryLimitMB into the job ceiling in bytes (8192 MB by default; 0: none)', () => {
    expect(parse({}).settings.options.memoryLimitBytes).toBe(8192 * 1024 * 1024);
    expect(parse({ memoryLimitMB: 512 }).settings.options.memoryLimitBytes).toBe(512 * 1024 * 1024);
    expect(parse({ memoryLimitMB: 0 }).settings.options.memoryLimitBytes).toBeNull();
    expect(parse({ memoryLimitMB: -1 }).problems).toEqual(['assay.memoryLimitMB: expected a whole number from 0 to 1048576, got -1; using 8192']);
  });

  it('passes assay.exactValuesLimit to the job (50 million by default)', () => {
    expect(parse({}).settings.options.exactValuesLimit).toBe(50_000_000);
    expect(parse({ exactValuesLimit: 1000 }).settings.options.exactValuesLimit).toBe(1000);
    expect(parse({ exactValuesLimit: 0 }).problems).toEqual(['assay.exactValuesLimit: expected a whole number from 1 to 1000000000, got 0; using 50000000']);
  });

  it('names unknown rule ids', () => {
    const { problems, settings } = parse({ 'rules.enabled': ['tukey-fence', 'gut-feeling'] });
    expect(problems[0]).toMatch(/^assay\.rules\.enabled: expected rule ids from: .* \(unknown: gut-feeling\), got \["tukey-fence","gut-feeling"\]; using /);
    expect([...settings.options.rules.enabled].sort()).toEqual([...DEFAULT_RULES].sort());
  });

  it('classifies what a change needs', () => {
    const base = parse({}).settings;
    expect([...changeNeeds(base, parse({}).settings)]).toEqual([]);
    expect([...changeNeeds(base, parse({ bins: 'sturges' }).settings)]).toEqual(['reprofile']);
    expect([...changeNeeds(base, parse({ significantDigits: 3 }).settings)]).toEqual(['render']);
    expect([...changeNeeds(base, parse({ 'diagnostics.max': 5 }).settings)]).toEqual(['diagnostics']);
  });
});

describe('package.json contributes.configuration', () => {
  const props = pkg.contributes.configuration.properties;

  it('documents exactly the keys of the settings table, each with a description', () => {
    expect(Object.keys(props).sort()).toEqual(SETTINGS.map((s) => `assay.${s.key}`).sort());
    for (const [key, p] of Object.entries(props)) expect(p.description ?? p.markdownDescription, key).toBeTruthy();
  });

  it('has the same defaults as the settings table, and each default passes its own check', () => {
    for (const s of SETTINGS) {
      expect(props[`assay.${s.key}`]!.default, s.key).toEqual(s.default);
      expect(s.check(s.default).ok, s.key).toBe(true);
    }
  });
});
