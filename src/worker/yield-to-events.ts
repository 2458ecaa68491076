// Lets the worker's event loop run (and a `cancel` message arrive) between chunks. A macrotask
// rather than a resolved promise: microtasks would run before any message event and the flag would
// never change. In Node, setImmediate runs after the loop's poll phase, where port messages are
// delivered, without the 1 ms floor of a timer (a thousand chunks per gigabyte); a Web Worker has
// only the timer.
const later: (f: () => void) => void = typeof setImmediate === 'function' ? (f) => setImmediate(f) : (f) => setTimeout(f, 0);

export function yieldToEvents(): Promise<void> {
  return new Promise((resolve) => later(resolve));
}
