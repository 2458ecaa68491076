// Lets the worker's event loop run (and a `cancel` message arrive) between chunks. A timer rather than
// a resolved promise: microtasks would run before any message event and the flag would never change.
export function yieldToEvents(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}
