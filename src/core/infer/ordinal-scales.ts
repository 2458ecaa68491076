// Ordered vocabularies that delivered data commonly uses for ordinal measures (common practice:
// rating scales, Likert-type agreement items, intensity grades). A text column is read as ordinal
// only when every distinct value belongs to one scale; otherwise it stays nominal.
export const ORDINAL_SCALES: readonly (readonly string[])[] = [
  ['very low', 'low', 'medium', 'high', 'very high'],
  ['very low', 'low', 'moderate', 'high', 'very high'],
  ['low', 'mid', 'high'],
  ['very light', 'light', 'medium-light', 'medium', 'medium-dark', 'dark', 'very dark'],
  ['light', 'medium', 'dark'],
  ['extra small', 'xs', 'small', 's', 'medium', 'm', 'large', 'l', 'extra large', 'xl', 'xxl'],
  ['tiny', 'small', 'medium', 'large', 'huge'],
  ['very poor', 'poor', 'fair', 'good', 'very good', 'excellent'],
  ['poor', 'average', 'good', 'excellent'],
  ['strongly disagree', 'disagree', 'neutral', 'agree', 'strongly agree'],
  ['strongly disagree', 'disagree', 'neither agree nor disagree', 'agree', 'strongly agree'],
  ['never', 'rarely', 'sometimes', 'often', 'always'],
  ['very dissatisfied', 'dissatisfied', 'neutral', 'satisfied', 'very satisfied'],
  ['very unlikely', 'unlikely', 'neutral', 'likely', 'very likely'],
  ['none', 'mild', 'moderate', 'severe'],
  ['minor', 'moderate', 'major', 'critical'],
  ['trace', 'light', 'moderate', 'heavy'],
  ['first', 'second', 'third', 'fourth', 'fifth'],
  ['primary', 'secondary', 'tertiary'],
  ['bronze', 'silver', 'gold', 'platinum'],
  ['q1', 'q2', 'q3', 'q4'],
];

/**
 * Finds the scale that contains every value (compared without case and surrounding space).
 * Returns the values in scale order, or null. Needs at least two distinct values.
 * @example ordinalOrder(['High', 'low']) // ['low', 'High']
 */
export function ordinalOrder(values: readonly string[]): string[] | null {
  if (values.length < 2) return null;
  const keys = values.map((v) => v.trim().toLowerCase().replace(/[_\s]+/g, ' '));
  for (const scale of ORDINAL_SCALES) {
    const rank = keys.map((k) => scale.indexOf(k));
    if (rank.every((r) => r >= 0)) {
      return values.map((v, i) => ({ v, r: rank[i] ?? 0 })).sort((a, b) => a.r - b.r).map((e) => e.v);
    }
  }
  return null;
}
