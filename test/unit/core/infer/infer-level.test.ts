import { describe, expect, it } from 'vitest';
import { inferLevel, type LevelInput } from '../../../../src/core/infer/infer-level';

const col = (c: Partial<LevelInput>): LevelInput => ({ name: 'x', type: 'decimal', distinctValues: [], distinct: 10, count: 100, min: 0, max: 1, ...c });

// Levels per Stevens (1946): a true zero makes a ratio scale, an arbitrary zero an interval scale,
// ordered categories an ordinal scale. The name hints are common practice and only defaults.
describe('inferLevel', () => {
  it('reads a non-negative measure as ratio and signed values as interval', () => {
    expect(inferLevel(col({ min: 0.2, max: 14 })).level).toBe('ratio');
    expect(inferLevel(col({ min: -3, max: 14 }))).toMatchObject({ level: 'interval', reason: 'negative values present: interval' });
  });
  it('reads temperatures in degrees Celsius as interval, kelvin as ratio', () => {
    expect(inferLevel(col({ name: 'charge_temp_c', min: 190, max: 210 })).level).toBe('interval');
    expect(inferLevel(col({ name: 'temp_kelvin', min: 290, max: 310 })).level).toBe('ratio');
  });
  it('reads dates as interval and booleans as nominal', () => {
    expect(inferLevel(col({ type: 'date' })).level).toBe('interval');
    expect(inferLevel(col({ type: 'boolean' })).level).toBe('nominal');
  });
  it('finds ordered words', () => {
    const d = inferLevel(col({ type: 'text', distinctValues: ['dark', 'light', 'medium'], distinct: 3 }));
    expect(d).toMatchObject({ level: 'ordinal', order: ['light', 'medium', 'dark'] });
    expect(inferLevel(col({ type: 'text', distinctValues: ['Kenya', 'Brazil'], distinct: 2 })).level).toBe('nominal');
  });
  it('reads whole-number identifiers as nominal', () => {
    expect(inferLevel(col({ name: 'station_id', type: 'integer', distinct: 100, count: 100, min: 1, max: 100 })).level).toBe('nominal');
  });
});
