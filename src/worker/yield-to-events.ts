// Lets the worker's event loop run (and a `cancel` message arrive) between chunks. A macrotask
// rather than a resolved promise: microtasks would run before any message event and the flag would
// never change. Not a timer either: a timer waits at least 1 ms (4 ms in a browser once nested), a
// wait per chunk that came to 0.6 s of a 9.5 s read of a 300 MB file in the editor's worker; a
// message or an immediate comes back as soon as the loop has run once.
const channel = typeof setImmediate === 'function' || typeof MessageChannel !== 'function' ? null : new MessageChannel();
const waiting: (() => void)[] = [];
if (channel) {
  channel.port1.onmessage = () => waiting.shift()?.();
}

export function yieldToEvents(): Promise<void> {
  if (typeof setImmediate === 'function') return new Promise((resolve) => setImmediate(resolve));
  if (channel) {
    return new Promise((resolve) => {
      waiting.push(resolve);
      channel.port2.postMessage(null);
    });
  }
  return new Promise((resolve) => setTimeout(resolve, 0));
}
