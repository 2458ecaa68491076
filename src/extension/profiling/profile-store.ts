// The latest profile per document URI, and the jobs in flight. Everything that shows a profile (the
// panel, the status bar, later the diagnostics and hovers) reads it here and listens for changes.
import type { RecordIndex } from '../../core/engine';
import type { Profile } from '../../core/profile/types';
import { Emitter } from '../util/emitter';

export interface StoredProfile {
  uri: string;
  /** Document version the profile was made from (0 for a file read from disk). */
  version: number;
  profile: Profile;
  index: RecordIndex;
  /** A first pass over the start of the file; the exact profile follows. */
  partial: boolean;
  /** Where the bytes came from: the document's text, or the file on disk (large files). */
  via: 'document' | 'disk';
}

export type ProfileEvent =
  | { kind: 'profile'; stored: StoredProfile }
  | { kind: 'progress'; uri: string; version: number; fraction: number | null }
  | { kind: 'failed'; uri: string; version: number; message: string }
  | { kind: 'progress-cleared'; uri: string }
  | { kind: 'removed'; uri: string };

export class ProfileStore {
  private readonly profiles = new Map<string, StoredProfile>();
  private readonly busy = new Map<string, { version: number; fraction: number | null }>();
  private readonly failures = new Map<string, { version: number; message: string }>();
  private readonly emitter = new Emitter<ProfileEvent>();
  readonly onDidChange = this.emitter.event;

  get(uri: string): StoredProfile | undefined {
    return this.profiles.get(uri);
  }

  /** Every stored profile (one per document). */
  all(): StoredProfile[] {
    return [...this.profiles.values()];
  }

  /** Job in flight for the document, if any. */
  progress(uri: string): { version: number; fraction: number | null } | undefined {
    return this.busy.get(uri);
  }

  /** Why the last job for the document failed, until a profile arrives. */
  failure(uri: string): { version: number; message: string } | undefined {
    return this.failures.get(uri);
  }

  set(stored: StoredProfile): void {
    this.profiles.set(stored.uri, stored);
    this.failures.delete(stored.uri);
    if (!stored.partial) this.busy.delete(stored.uri);
    this.emitter.fire({ kind: 'profile', stored });
  }

  setProgress(uri: string, version: number, fraction: number | null): void {
    this.busy.set(uri, { version, fraction });
    this.emitter.fire({ kind: 'progress', uri, version, fraction });
  }

  setFailed(uri: string, version: number, message: string): void {
    this.busy.delete(uri);
    this.failures.set(uri, { version, message });
    this.emitter.fire({ kind: 'failed', uri, version, message });
  }

  /** Job ended without a result (cancelled); nothing to announce beyond clearing the busy mark. */
  clearProgress(uri: string): void {
    if (this.busy.delete(uri)) this.emitter.fire({ kind: 'progress-cleared', uri });
  }

  delete(uri: string): void {
    this.busy.delete(uri);
    this.failures.delete(uri);
    if (this.profiles.delete(uri)) this.emitter.fire({ kind: 'removed', uri });
  }

  dispose(): void {
    this.emitter.dispose();
    this.profiles.clear();
  }
}
