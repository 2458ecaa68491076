// The shape check: normality tests as evidence, never as proof.
import type { ShapeCheck } from '../src/core/profile/types';
import { el, note, section, visible } from './dom';
import { count, num } from './format';
import { dataTable, scroller } from './table';

const METHODS: Record<string, string> = {
  'shapiro-wilk': 'Shapiro-Wilk W',
  'dagostino-pearson': 'D’Agostino-Pearson K²',
};

export const SHAPE_CAUTION = 'A test is not proof. A small p-value is evidence against a normal shape; a large one only means this test found none, and with many values tiny departures give small p-values. Look at the histogram too.';

export function shapeSection(shape: ShapeCheck, digits: number): HTMLElement {
  const { root, body } = section('Shape check: is a normal shape plausible?');
  if (shape.tests.length > 0) {
    body.append(scroller(dataTable({
      caption: 'Normality tests',
      columns: [{ label: 'Test' }, { label: 'Statistic', numeric: true }, { label: 'p', numeric: true }, { label: 'n', numeric: true }],
      rows: shape.tests.map((t) => [Object.hasOwn(METHODS, t.method) ? METHODS[t.method] ?? t.method : visible(t.method, 40), num(t.statistic, digits), num(t.p, digits), count(t.n)]),
    })));
  }
  for (const reason of shape.skipped) body.append(note(visible(reason, 300), 'muted'));
  const caution = shape.caution.trim() === '' ? SHAPE_CAUTION : visible(shape.caution, 600);
  body.append(el('p', { className: 'caution', text: caution }));
  return root;
}
