// The worker's yield between chunks: a macrotask that lets messages in, without a timer's wait
// (at least 1 ms in Node, 4 ms once nested in a browser: HTML's timer initialisation steps).
import { MessageChannel as NodeChannel } from 'node:worker_threads';
import { afterEach, describe, expect, it, vi } from 'vitest';

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
  vi.resetModules();
});

describe('yieldToEvents', () => {
  it('comes back without any timer running (timers faked and never advanced)', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'setInterval'] });
    const { yieldToEvents } = await import('../../../src/worker/yield-to-events');
    for (let i = 0; i < 100; i++) await yieldToEvents();
    expect(vi.getTimerCount()).toBe(0);
  }, 5000); // with a timer, it would never come back

  it('lets a message that has already arrived in before it comes back', async () => {
    const { yieldToEvents } = await import('../../../src/worker/yield-to-events');
    const { port1, port2 } = new NodeChannel();
    let seen = 0;
    port1.on('message', () => { seen++; });
    for (let i = 1; i <= 20; i++) {
      port2.postMessage(i);
      await yieldToEvents();
      expect(seen).toBe(i);
    }
    port1.close();
  });

  it('in a browser (no setImmediate) yields by a message to itself, in order, and no timer', async () => {
    vi.stubGlobal('setImmediate', undefined);
    vi.useFakeTimers({ toFake: ['setTimeout', 'setInterval'] });
    const { yieldToEvents } = await import('../../../src/worker/yield-to-events');
    const order: number[] = [];
    await Promise.all([1, 2, 3].map((i) => yieldToEvents().then(() => order.push(i))));
    expect(order).toEqual([1, 2, 3]);
    expect(vi.getTimerCount()).toBe(0);
  }, 5000);
});
