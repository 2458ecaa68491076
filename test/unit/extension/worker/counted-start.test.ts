// Live worker count: up on start, down once on terminate or failure (never twice).
import { describe, expect, it } from 'vitest';
import { countedStart } from '../../../../src/extension/worker/counted-start';
import type { WorkerPort } from '../../../../src/extension/worker/worker-port';

function fake() {
  let fail: ((e: Error) => void) | undefined;
  const port: WorkerPort = { post: () => undefined, onMessage: () => undefined, onError: (l) => { fail = l; }, terminate: () => undefined };
  return { port, fail: (m: string) => fail?.(new Error(m)) };
}

describe('countedStart', () => {
  it('counts started workers until they end', () => {
    const fakes: ReturnType<typeof fake>[] = [];
    const c = countedStart(() => { const f = fake(); fakes.push(f); return f.port; });
    const a = c.start();
    const b = c.start();
    expect(c.live()).toBe(2);
    a.terminate();
    a.terminate();
    expect(c.live()).toBe(1);
    fakes[1]!.fail('crash');
    b.terminate();
    expect(c.live()).toBe(0);
  });
});
