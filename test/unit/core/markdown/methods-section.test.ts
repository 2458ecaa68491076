import { describe, expect, it } from 'vitest';
import { cautions, methodNotes } from '../../../../src/core/markdown/methods-section';
import { resolveOptions } from '../../../../src/core/options';
import { buildColumn, buildNumericStats, buildProfile } from './profile-builder';

const numeric = buildColumn({
  name: 'v', type: 'decimal', level: 'ratio', stats: buildNumericStats({ quantileType: 6 }),
  histogram: { rule: 'sturges', label: 'Sturges, 5 intervals', edgeMode: 'nice', width: 1, edges: [0, 1], counts: [1] },
  shape: { tests: [{ method: 'dagostino-pearson', statistic: 3.92371918, p: 0.14059673, n: 24 }], skipped: [], caution: '' },
});

function topics(notes: { topic: string }[]): string[] {
  return notes.map((n) => n.topic);
}

describe('methodNotes', () => {
  it('cites the quantile definition of the numeric columns', () => {
    const text = methodNotes(buildProfile({ columns: [numeric] })).find((n) => n.topic === 'Quantiles')?.text;
    expect(text).toContain('Hyndman & Fan (1996), The American Statistician 50:361–365, definition 6.');
    expect(text).not.toContain('R and NumPy');
  });

  it('reads the definition from the methods text when no column is numeric', () => {
    const text = methodNotes(buildProfile({ methods: { quantile: 'Hyndman & Fan (1996) type 7', bins: 'fd', edges: 'nice', missingTokens: [] } }))
      .find((n) => n.topic === 'Quantiles')?.text;
    expect(text).toContain('definition 7 (the default of R and NumPy)');
  });

  it('cites the bin rule with its formula and the shape tests used', () => {
    const notes = methodNotes(buildProfile({ columns: [numeric] }));
    expect(notes.find((n) => n.topic === 'Bins')?.text).toContain('Sturges (1926), Journal of the American Statistical Association 21:65–66: k = ⌈log₂ n⌉ + 1 bins.');
    expect(topics(notes)).toContain('D’Agostino-Pearson');
    expect(topics(notes)).not.toContain('Shapiro-Wilk');
  });

  it('without options lists only the rules that flagged something, with default thresholds', () => {
    const col = { ...numeric, flagTotals: [{ rule: 'modified-z', column: 'v', total: 1, kept: 1 }] };
    const notes = methodNotes(buildProfile({ columns: [col] }));
    expect(notes.find((n) => n.topic === 'Flag “modified-z”')?.text).toContain('|M| > 3.5.'); // Iglewicz & Hoaglin's 3.5
    expect(topics(notes)).not.toContain('Flag “tukey-fence”');
    expect(notes.at(-1)).toEqual({ topic: 'Rules', text: 'only the rules that flagged something are listed.' });
  });

  it('with the options lists every rule that ran, with its real thresholds', () => {
    const options = resolveOptions({ rules: { enabled: ['tukey-fence', 'grubbs'], tukeyK: 2.2, grubbsAlpha: 0.01 } });
    const notes = methodNotes(buildProfile({ columns: [numeric] }), options.rules);
    expect(notes.find((n) => n.topic === 'Flag “tukey-fence”')?.text).toContain('with k = 2.2; beyond k = 3');
    expect(notes.find((n) => n.topic === 'Flag “grubbs”')?.text).toContain('at α = 0.01');
    expect(topics(notes)).not.toContain('Rules');
  });
});

describe('cautions', () => {
  it('says flags are candidates and tests are not proof, and marks a first pass', () => {
    const all = cautions(buildProfile({ partial: true, rows: 100 }));
    expect(all[0]).toMatch(/^Flagged values are candidates for review, not errors\./);
    expect(all[1]).toMatch(/^A normality test is not proof of normality/);
    expect(all.at(-1)).toBe('This report covers the first 100 records only (a first pass).');
  });
});
