// The profile store: a first pass keeps the job busy, the exact profile ends it, a failure is kept
// until a profile arrives, and every change is announced.
import { describe, expect, it } from 'vitest';
import type { Profile } from '../../../../src/core/profile/types';
import { ProfileStore } from '../../../../src/extension/profiling/profile-store';
import type { ProfileEvent, StoredProfile } from '../../../../src/extension/profiling/profile-store';

const stored = (partial: boolean, version = 1): StoredProfile => ({
  uri: 'file:///a.csv', version, profile: { rows: partial ? 10 : 20 } as Profile, index: { offsets: new Float64Array(0), lines: new Float64Array(0) }, partial, via: 'document',
});

describe('ProfileStore', () => {
  it('tracks progress, first pass, exact profile and failure for a document', () => {
    const store = new ProfileStore();
    const events: ProfileEvent['kind'][] = [];
    store.onDidChange((e) => events.push(e.kind));
    const uri = 'file:///a.csv';
    store.setProgress(uri, 1, 0.5);
    expect(store.progress(uri)).toEqual({ version: 1, fraction: 0.5 });
    store.set(stored(true));
    expect(store.progress(uri)).toBeDefined();
    store.set(stored(false));
    expect(store.progress(uri)).toBeUndefined();
    expect(store.get(uri)?.profile.rows).toBe(20);
    store.setFailed(uri, 2, 'boom');
    expect(store.failure(uri)).toEqual({ version: 2, message: 'boom' });
    store.set(stored(false, 3));
    expect(store.failure(uri)).toBeUndefined();
    expect(store.all().map((s) => [s.uri, s.version])).toEqual([[uri, 3]]);
    store.setProgress(uri, 4, null);
    store.clearProgress(uri);
    store.clearProgress(uri);
    store.delete(uri);
    expect(store.get(uri)).toBeUndefined();
    expect(events).toEqual(['progress', 'profile', 'profile', 'failed', 'profile', 'progress', 'progress-cleared', 'removed']);
  });
});
