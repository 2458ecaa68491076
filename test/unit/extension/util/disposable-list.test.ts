// Disposal lists: reverse order, keep going past a failure, dispose late additions at once, idempotent.
import { describe, expect, it, vi } from 'vitest';
import { DisposableList } from '../../../../src/extension/util/disposable-list';
import { Emitter } from '../../../../src/extension/util/emitter';

describe('DisposableList', () => {
  it('disposes in reverse order, past a failing item, once', () => {
    const order: string[] = [];
    const list = new DisposableList();
    list.add({ dispose: () => order.push('a') });
    list.add({ dispose: () => { throw new Error('boom'); } });
    list.add({ dispose: () => order.push('c') });
    const error = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    list.dispose();
    list.dispose();
    error.mockRestore();
    expect(order).toEqual(['c', 'a']);
    expect(list.isDisposed).toBe(true);
  });

  it('disposes an item added after disposal at once', () => {
    const list = new DisposableList();
    list.dispose();
    const d = { dispose: vi.fn() };
    expect(list.add(d)).toBe(d);
    expect(d.dispose).toHaveBeenCalledOnce();
  });
});

describe('Emitter', () => {
  it('delivers to listeners until they unsubscribe, and a failing listener does not stop the others', () => {
    const e = new Emitter<number>();
    const seen: number[] = [];
    const sub = e.event((v) => seen.push(v));
    e.event(() => { throw new Error('listener'); });
    const error = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    e.fire(1);
    sub.dispose();
    e.fire(2);
    error.mockRestore();
    expect(seen).toEqual([1]);
  });
});
