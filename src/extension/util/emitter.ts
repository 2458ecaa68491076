// A tiny event emitter for modules that must not import `vscode` (so plain vitest can run them).
// Same shape as vscode.Event: subscribe returns a disposable.
import type { Disposable } from './disposable-list';

export type Listener<T> = (value: T) => void;
export type Event<T> = (listener: Listener<T>) => Disposable;

export class Emitter<T> implements Disposable {
  private listeners = new Set<Listener<T>>();

  readonly event: Event<T> = (listener) => {
    this.listeners.add(listener);
    return { dispose: () => this.listeners.delete(listener) };
  };

  fire(value: T): void {
    for (const l of [...this.listeners]) {
      try {
        l(value);
      } catch (e) {
        console.error('assay: listener failed', e);
      }
    }
  }

  dispose(): void {
    this.listeners.clear();
  }
}
