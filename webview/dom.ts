// Safe element helpers. The panel builds every node through these: tag names are literals in our
// code, text goes in as text nodes, and nothing read from a file ever becomes markup, an element
// name, an attribute name or a URL.
import { CUT_MARK, revealText, segments } from './reveal';

type Child = Node | string | null | undefined | false;

export interface ElementOptions {
  className?: string;
  text?: string;
  /** Tooltip text (set as a property, so it is inert). */
  title?: string;
}

/** Creates an element of a literal tag with optional class, text and children. */
export function el<K extends keyof HTMLElementTagNameMap>(tag: K, options: ElementOptions = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (options.className) node.className = options.className;
  if (options.title !== undefined) node.title = options.title;
  if (options.text !== undefined) node.textContent = options.text;
  append(node, ...children);
  return node;
}

/** Appends children; strings become text nodes (Node.append never parses markup). */
export function append(parent: Node & ParentNode, ...children: Child[]): void {
  for (const child of children) {
    if (child === null || child === undefined || child === false) continue;
    parent.append(child);
  }
}

/** Removes every child. */
export function clear(node: Node): void {
  while (node.firstChild) node.removeChild(node.firstChild);
}

/** A real <button type="button"> with a click handler. */
export function button(label: string, onClick: (event: MouseEvent) => void, className = 'btn'): HTMLButtonElement {
  const b = el('button', { className, text: label });
  b.type = 'button';
  b.addEventListener('click', onClick);
  return b;
}

/** Longest value shown inline, in code points; the full text goes to the tooltip. */
export const SHORT_VALUE = 80;
/** Longest tooltip, in code points: a 10 000-character cell must not build a 10 000-character tooltip. */
const TOOLTIP_MAX = 2000;

/** The plain-text visible form of a value from the file: hidden and bidi characters as ⟨U+202E⟩, cut at `max`. */
export function visible(text: string, max = SHORT_VALUE): string {
  return revealText(text, max);
}

/**
 * A span showing a value from the file inertly: invisible and bidirectional characters as marked
 * tokens (U+202E in a box, with the character's name as tooltip), line breaks as ↵, spaces at the
 * edges as ␣, an empty value as "(empty)", long values cut with the whole (up to 2000 code points)
 * in the tooltip. `unicode-bidi: isolate` in the CSS keeps right-to-left text from reordering its
 * neighbours.
 */
export function valueText(text: string, max = SHORT_VALUE): HTMLSpanElement {
  if (text === '') return el('span', { className: 'value empty', text: '(empty)' });
  const { parts, cut } = segments(text, max);
  const span = el('span', { className: 'value' });
  let changed = cut;
  for (const p of parts) {
    if (p.kind === 'text') span.append(p.text);
    else {
      changed = true;
      span.append(el('span', { className: 'mark', text: p.text, title: p.title }));
    }
  }
  if (cut) span.append(el('span', { className: 'cut', text: CUT_MARK }));
  if (changed) span.title = visible(text, TOOLTIP_MAX);
  return span;
}

/** A heading plus a toolbar (for copy buttons) above a body. */
export function section(title: string, level: 'h2' | 'h3' = 'h3', ...tools: Child[]): { root: HTMLElement; body: HTMLDivElement; heading: HTMLHeadingElement } {
  const heading = el(level, { text: title });
  const bar = el('div', { className: 'section-bar' }, heading, el('div', { className: 'tools' }, ...tools));
  const body = el('div', { className: 'section-body' });
  const root = el('section', { className: 'block' }, bar, body);
  return { root, body, heading };
}

/** A short paragraph of explanatory text. */
export function note(text: string, className = 'note'): HTMLParagraphElement {
  return el('p', { className, text });
}

let nextId = 0;
/** A fresh element id for label/for and aria links (never derived from data). */
export function uid(prefix: string): string {
  nextId += 1;
  return `assay-${prefix}-${nextId}`;
}
