import { describe, expect, it } from 'vitest';
import { barChartSvg, histogramSvg } from '../../../../src/core/html/svg-charts';

function rects(svg: string): { x: number; y: number; width: number; height: number }[] {
  return [...svg.matchAll(/<rect class="bar[^"]*" x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)"/g)]
    .map((m) => ({ x: Number(m[1]), y: Number(m[2]), width: Number(m[3]), height: Number(m[4]) }));
}

describe('histogramSvg', () => {
  // d3-array's test set [3, 6, 7, 8, 8, 10, 13, 15, 16, 20] in width-5 bins from 0: counts 1, 4, 2, 2, 1.
  const svg = histogramSvg([0, 5, 10, 15, 20, 25], [1, 4, 2, 2, 1], false, 4, 'cap1');

  it('draws one bar per interval, touching, heights proportional to counts', () => {
    const bars = rects(svg);
    expect(bars).toHaveLength(5);
    for (let i = 1; i < bars.length; i++) expect(bars[i]?.x).toBeCloseTo((bars[i - 1]?.x ?? 0) + (bars[i - 1]?.width ?? 0), 0);
    const unit = (bars[0]?.height ?? 0) / 1;
    expect(bars.map((b) => Math.round(b.height / unit))).toEqual([1, 4, 2, 2, 1]);
  });

  it('labels the edges and the intervals, and points at its caption', () => {
    expect(svg).toContain('<title>[0, 5): 1</title>');
    expect(svg).toContain('<title>[20, 25): 1</title>');
    expect(svg).toContain('aria-labelledby="cap1"');
    expect(svg).toMatch(/>25<\/text>/);
    const closed = histogramSvg([0, 5, 10], [1, 1], true, 4, 'c');
    expect(closed).toContain('<title>[5, 10]: 1</title>');
  });

  it('has no script, event attribute or external reference', () => {
    expect(svg).not.toMatch(/<script|\son\w+=|href|xlink|url\(/i);
    expect(svg.startsWith('<svg class="chart" viewBox="0 0 640 240" role="img"')).toBe(true);
  });

  it('draws an all-zero histogram without dividing by zero', () => {
    expect(rects(histogramSvg([0, 1], [0], false, 4, 'z'))[0]?.height).toBe(0);
  });
});

describe('barChartSvg', () => {
  it('draws one bar per category with gaps, and escapes the labels', () => {
    const svg = barChartSvg([{ value: '<img src=x onerror=alert(1)>', count: 4 }, { value: '', count: 2 }], 'cap2');
    const bars = rects(svg);
    expect(bars).toHaveLength(2);
    expect((bars[0]?.y ?? 0) + (bars[0]?.height ?? 0)).toBeLessThan(bars[1]?.y ?? 0);
    expect(bars[1]?.width).toBeCloseTo((bars[0]?.width ?? 0) / 2, 0);
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;: 4');
    expect(svg).toContain('>(empty)</text>');
    expect(svg).not.toMatch(/<img|<script/);
    // Event attributes would sit inside a tag: none of the tags has one.
    for (const tag of svg.match(/<[a-z][^>]*>/g) ?? []) expect(tag).not.toMatch(/\son\w+=/);
  });
});
