// What the panel remembers across a reload (VS Code keeps it with the webview): the file, the
// selected column and the user's choices in the detail. The host's serializer re-sends the profile.
import type { BinChoice } from '../src/core/options';
import type { PanelToHost } from '../src/protocol/webview';

export interface PanelState {
  uri: string | null;
  column: string | null;
  /** Bin choice per numeric column, when the user picked one other than the setting. */
  bins: Record<string, BinChoice>;
  /** Group-by column per numeric column. */
  groupBy: Record<string, string>;
  /** Histogram counts or the cumulative view. */
  view: 'counts' | 'cumulative';
}

interface VsCodeApi {
  postMessage(message: unknown): void;
  getState(): unknown;
  setState(state: unknown): void;
}

declare function acquireVsCodeApi(): VsCodeApi;

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function stringMap(v: unknown): Record<string, string> {
  const out: Record<string, string> = Object.create(null) as Record<string, string>;
  if (isRecord(v)) for (const [k, x] of Object.entries(v)) if (typeof x === 'string') out[k] = x;
  return out;
}

function isBinChoice(v: unknown): v is BinChoice {
  if (!isRecord(v) || typeof v.rule !== 'string') return false;
  if (v.rule === 'count') return typeof v.count === 'number' && Number.isInteger(v.count) && v.count >= 1;
  if (v.rule === 'width') return typeof v.width === 'number' && v.width > 0;
  return ['sqrt', 'sturges', 'rice', 'doane', 'scott', 'fd', 'auto'].includes(v.rule);
}

/** Reads a saved state defensively: an older panel version may have saved another shape. */
export function readState(saved: unknown): PanelState {
  const s = isRecord(saved) ? saved : {};
  const bins: Record<string, BinChoice> = Object.create(null) as Record<string, BinChoice>;
  if (isRecord(s.bins)) for (const [k, x] of Object.entries(s.bins)) if (isBinChoice(x)) bins[k] = x;
  return {
    uri: typeof s.uri === 'string' ? s.uri : null,
    column: typeof s.column === 'string' ? s.column : null,
    bins,
    groupBy: stringMap(s.groupBy),
    view: s.view === 'cumulative' ? 'cumulative' : 'counts',
  };
}

/** The host connection: typed posting and the persisted state. */
export class Host {
  private readonly api: VsCodeApi;
  state: PanelState;

  constructor() {
    this.api = acquireVsCodeApi();
    this.state = readState(this.api.getState());
  }

  post(message: PanelToHost): void {
    this.api.postMessage(message);
  }

  update(change: Partial<PanelState>): void {
    this.state = { ...this.state, ...change };
    this.api.setState(this.state);
  }
}
