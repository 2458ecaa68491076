// A list of things to dispose together, one per lifetime (extension, panel, document). Disposing
// runs in reverse order of adding, keeps going past a failing item, and makes later adds dispose at once.
export interface Disposable {
  dispose(): unknown;
}

export class DisposableList implements Disposable {
  private items: Disposable[] = [];
  private disposed = false;

  get isDisposed(): boolean {
    return this.disposed;
  }

  add<T extends Disposable>(item: T): T {
    if (this.disposed) item.dispose();
    else this.items.push(item);
    return item;
  }

  dispose(): void {
    if (this.disposed) return;
    this.disposed = true;
    const items = this.items.reverse();
    this.items = [];
    for (const item of items) {
      try {
        item.dispose();
      } catch (e) {
        console.error('assay: dispose failed', e);
      }
    }
  }
}
