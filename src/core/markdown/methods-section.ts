// "Methods and sources": every method the report used, with its definition and where it is published,
// and the cautions that go with reading flags and tests. Only methods the profile actually used appear.
import type { RuleOptions } from '../options';
import type { Profile } from '../profile/types';
import { isNumericStats } from './centre-spread';

export interface MethodNote {
  topic: string;
  text: string;
}

const BIN_RULES: Record<string, string> = {
  sqrt: 'square-root choice: k = ⌈√n⌉ bins.',
  sturges: 'Sturges (1926), Journal of the American Statistical Association 21:65–66: k = ⌈log₂ n⌉ + 1 bins.',
  rice: 'Rice rule: k = ⌈2 n^(1/3)⌉ bins.',
  doane: 'Doane (1976), The American Statistician 30:181–183: k = 1 + log₂ n + log₂(1 + |g₁|/σ(g₁)) bins, '
    + 'σ(g₁) = √(6(n − 2)/((n + 1)(n + 3))); it adds bins for skewed data.',
  scott: 'Scott (1979), Biometrika 66:605–610: bin width h = 3.49 σ n^(−1/3), σ the standard deviation.',
  fd: 'Freedman & Diaconis (1981), Zeitschrift für Wahrscheinlichkeitstheorie und verwandte Gebiete 57:453–476: '
    + 'bin width h = 2 IQR n^(−1/3); robust to outliers.',
  auto: 'the smaller bin width of Freedman-Diaconis (2 IQR n^(−1/3)) and Sturges (range/(log₂ n + 1)).',
  count: 'a set number of bins of equal width.',
  width: 'a set bin width.',
};

/** The settings the rule texts quote: the user's when given, else the defaults of `resolveOptions`. */
type RuleNumbers = Pick<RuleOptions, 'tukeyK' | 'tukeyFarK' | 'modifiedZThreshold' | 'zThreshold' | 'grubbsAlpha' | 'esdMaxOutliers' | 'esdAlpha'>;

const DEFAULT_NUMBERS: RuleNumbers = { tukeyK: 1.5, tukeyFarK: 3, modifiedZThreshold: 3.5, zThreshold: 3, grubbsAlpha: 0.05, esdMaxOutliers: 10, esdAlpha: 0.05 };

const NUMERIC_RULES: Record<string, (n: RuleNumbers) => string> = {
  'tukey-fence': (n) => 'Tukey fences (Tukey 1977, Exploratory Data Analysis, Addison-Wesley): a value below Q1 − k·IQR or above '
    + `Q3 + k·IQR, with k = ${n.tukeyK}; beyond k = ${n.tukeyFarK} a value is "far out". Each flag states its fences.`,
  'modified-z': (n) => 'modified z-score (Iglewicz & Hoaglin 1993, How to Detect and Handle Outliers, ASQC; recommended in the '
    + `NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.5.17): M = 0.6745 (x − median)/MAD, flagged when |M| > ${n.modifiedZThreshold}.`,
  'z-score': (n) => `z-score: |x − mean|/SD above ${n.zThreshold}; outliers inflate the SD, so this rule can miss them in small samples.`,
  grubbs: (n) => 'Grubbs’ test (Grubbs 1969, Technometrics 11:1–21): G = max |x − mean|/SD against a critical value from Student’s t '
    + `at α = ${n.grubbsAlpha}; it assumes normal data and finds one outlier.`,
  'generalized-esd': (n) => 'generalized extreme Studentized deviate test (Rosner 1983, Technometrics 25:165–172): up to '
    + `${n.esdMaxOutliers} outliers at α = ${n.esdAlpha}, tested one after another; it assumes normal data.`,
};

const RULES: Record<string, string> = {
  'not-a-number': 'a cell in a numeric column that does not read as a number.',
  'not-a-date': 'a cell in a date column that does not read as a date.',
  'impossible-date': 'a date written in a valid pattern that names no day of the calendar (such as 31 April).',
  'not-a-boolean': 'a cell in a true/false column that is neither.',
  'out-of-domain': 'a value outside the categories or range the column allows.',
  'mixed-missing-tokens': 'a column that writes missing values in more than one way.',
  'surrounding-whitespace': 'a cell with spaces before or after its text.',
  'category-variant': 'categories that differ only in case, spacing or accents, and may be meant as one.',
  'near-constant': 'a column where almost every cell holds the same value.',
  'ragged-row': 'a record with more or fewer fields than the header (RFC 4180, section 2, rule 4, asks for the same number in every record).',
  'duplicate-record': 'a record identical to an earlier one.',
  'duplicate-key': 'a key value that appears in more than one record.',
  constraint: 'a cell that breaks a constraint of the CSV on the Web metadata (W3C, Metadata Vocabulary for Tabular Data).',
};

/** The Hyndman & Fan definition used, from the numeric columns, else read from the methods text. */
function quantileType(profile: Profile): number | null {
  for (const c of profile.columns) if (isNumericStats(c.stats)) return c.stats.quantileType;
  const m = /type\s*([1-9])\b/i.exec(profile.methods.quantile);
  return m ? Number(m[1]) : null;
}

/**
 * The methods the profile used, each with its definition and published source. `rules` (the options the
 * profile was made with) adds the rules that ran but flagged nothing, and puts their real thresholds in
 * the text; without it, only rules that flagged something are listed, with the default thresholds.
 */
export function methodNotes(profile: Profile, rules?: RuleOptions): MethodNote[] {
  const notes: MethodNote[] = [];
  notes.push({
    topic: 'Reading',
    text: 'records are split as RFC 4180 describes (a quoted field may hold delimiters, line breaks and doubled quotes), '
      + 'with the delimiter, quote and encoding listed under File.',
  });
  const tokens = profile.methods.missingTokens.map((t) => `“${t}”`).join(', ');
  notes.push({ topic: 'Missing values', text: `a cell equal to one of these counts as missing and is skipped by every statistic: ${tokens || '(none)'}.` });
  notes.push({
    topic: 'Levels of measurement',
    text: 'after Stevens (1946), Science 103:677–680; each column shows only the statistics its level allows '
      + '(nominal: counts and modes; ordinal: + order statistics; interval: + mean and SD; ratio: + ratios such as the CV).',
  });
  const q = quantileType(profile);
  notes.push({
    topic: 'Quantiles',
    text: q === null
      ? `quartiles and medians as the engine reports them (${profile.methods.quantile}); Hyndman & Fan (1996), The American Statistician 50:361–365, list the definitions.`
      : `quartiles, medians and IQRs follow Hyndman & Fan (1996), The American Statistician 50:361–365, definition ${q}`
        + `${q === 7 ? ' (the default of R and NumPy)' : ''}. Ordered categories use definition 1, which returns an observed category.`,
  });
  if (profile.columns.some((c) => isNumericStats(c.stats))) {
    notes.push({
      topic: 'Spread and shape',
      text: 'SD and variance divide by n − 1; the standard error of the mean is SD/√n; MAD is the raw median absolute deviation '
        + '(not scaled by 1.4826); the trimmed mean drops 10% of values at each end; skewness G₁ is the adjusted '
        + 'Fisher-Pearson coefficient and kurtosis G₂ the sample excess kurtosis (Joanes & Gill 1998, The Statistician 47:183–189); '
        + 'the coefficient of variation is SD/mean and the geometric mean needs all values above 0, both for ratio data only.',
    });
  }
  const binRules = new Set<string>();
  for (const c of profile.columns) {
    if (c.histogram) binRules.add(c.histogram.rule);
    if (c.grouped) binRules.add(c.grouped.rule);
  }
  if (binRules.size > 0) {
    const edges = profile.methods.edges === 'nice'
      ? 'edges are moved to round numbers that cover the data, and every interval is half-open, [a, b)'
      : 'edges run from the minimum to the maximum; every interval is half-open, [a, b), except the last, [a, b], which holds the maximum';
    const rules = [...binRules].sort().map((r) => BIN_RULES[r] ?? `rule “${r}”.`).join(' ');
    notes.push({ topic: 'Bins', text: `${rules} ${edges[0]?.toUpperCase()}${edges.slice(1)}. Setting: ${profile.methods.bins}.` });
  }
  const methods = new Set<string>();
  for (const c of profile.columns) for (const t of c.shape?.tests ?? []) methods.add(t.method);
  if (methods.has('shapiro-wilk')) {
    notes.push({
      topic: 'Shapiro-Wilk',
      text: 'W of Shapiro & Wilk (1965), Biometrika 52:591–611, with coefficients and p-value by Royston’s approximation '
        + '(Royston 1995, Applied Statistics 44:547–551, algorithm AS R94).',
    });
  }
  if (methods.has('dagostino-pearson')) {
    notes.push({
      topic: 'D’Agostino-Pearson',
      text: 'K² = Z(√b₁)² + Z(b₂)², the skewness test of D’Agostino (1971), Biometrika 58:341–348, and the kurtosis test of '
        + 'Anscombe & Glynn (1983), Biometrika 70:227–234, combined as D’Agostino & Pearson (1973), Biometrika 60:613–622 '
        + 'propose; p from the chi-square distribution with 2 degrees of freedom.',
    });
  }
  const ruleIds = new Set<string>();
  for (const c of profile.columns) {
    for (const f of c.flags) ruleIds.add(f.rule);
    for (const t of c.flagTotals) ruleIds.add(t.rule);
  }
  for (const f of profile.recordFlags) ruleIds.add(f.rule);
  for (const t of profile.recordFlagTotals) ruleIds.add(t.rule);
  for (const r of rules?.enabled ?? []) ruleIds.add(r);
  const numbers = rules ?? DEFAULT_NUMBERS;
  for (const r of [...ruleIds].sort()) {
    notes.push({ topic: `Flag “${r}”`, text: NUMERIC_RULES[r]?.(numbers) ?? RULES[r] ?? 'a rule of the engine.' });
  }
  if (!rules) notes.push({ topic: 'Rules', text: 'only the rules that flagged something are listed.' });
  return notes;
}

/** The cautions every report ends with. */
export function cautions(profile: Profile): string[] {
  const out = [
    'Flagged values are candidates for review, not errors. Remove or change a value only for a reason outside the '
      + 'statistics, such as a recording mistake you can confirm or a unit that does not belong; being far from the other values is not such a reason.',
    'A normality test is not proof of normality: a large p-value only means this sample gave no strong evidence against it. '
      + 'Small samples seldom reject; very large samples reject departures too small to matter.',
    'Types and levels marked “inferred” are read from the values; declare them when you know the data better.',
  ];
  if (profile.partial) out.push(`This report covers the first ${profile.rows} records only (a first pass).`);
  return out;
}
