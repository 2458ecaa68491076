// The host <-> panel protocol. Both ends import this file; every message is JSON-safe, carries the
// document URI (and version where it refers to a profile), and is checked by a guard on receipt.
import type { BinChoice } from '../core/options';
import type { GroupComparison, GroupedTable, Histogram, Profile } from '../core/profile/types';

/** What the panel may copy as Markdown; the host renders it with the core's Markdown module. */
export type CopyTarget = 'summary' | 'column' | 'frequencies' | 'grouped' | 'groups' | 'flags' | 'report';

export interface PanelSettings {
  significantDigits: number;
  bins: BinChoice;
  edges: 'nice' | 'exact';
}

export type HostToPanel =
  | { type: 'profile'; uri: string; version: number; fileLabel: string; profile: Profile; settings: PanelSettings }
  | { type: 'progress'; uri: string; version: number; fraction: number | null; message: string }
  | { type: 'failed'; uri: string; version: number; message: string }
  | { type: 'focus-column'; uri: string; column: string }
  | { type: 'bins-result'; uri: string; version: number; requestId: number; column: string; histogram: Histogram | null; grouped: GroupedTable | null; error?: string }
  | { type: 'groups-result'; uri: string; version: number; requestId: number; comparison: GroupComparison | null; error?: string };

export type PanelToHost =
  | { type: 'ready' }
  | { type: 'reveal'; uri: string; row: number; field: number | null }
  /** `report` asks the host to write the whole report as a document (and open it), not to copy it. */
  | { type: 'copy'; uri: string; version: number; target: CopyTarget; column?: string; by?: string; bins?: BinChoice }
  | { type: 'request-bins'; uri: string; version: number; requestId: number; column: string; bins: BinChoice }
  | { type: 'request-groups'; uri: string; version: number; requestId: number; numeric: string; by: string }
  | { type: 'select-column'; uri: string; column: string | null }
  /**
   * Sent after each render so tests (and the host) know what the panel shows. `flags` is the total
   * number of findings (every column's and the record-level flagTotals), not only the kept ones.
   */
  | { type: 'rendered'; uri: string; version: number; columns: string[]; rows: number; flags: number; partial: boolean };

type Shape = Record<string, 'string' | 'number' | 'boolean' | 'object' | 'string?' | 'number?' | 'object?' | 'object|null' | 'number|null' | 'string|null' | 'array'>;

function matches(m: Record<string, unknown>, shape: Shape): boolean {
  for (const [key, kind] of Object.entries(shape)) {
    const v = m[key];
    switch (kind) {
      case 'string?': if (v !== undefined && typeof v !== 'string') return false; break;
      case 'number?': if (v !== undefined && typeof v !== 'number') return false; break;
      case 'object?': if (v !== undefined && (typeof v !== 'object' || v === null)) return false; break;
      case 'object|null': if (v !== null && (typeof v !== 'object' || Array.isArray(v))) return false; break;
      case 'number|null': if (v !== null && typeof v !== 'number') return false; break;
      case 'string|null': if (v !== null && typeof v !== 'string') return false; break;
      case 'array': if (!Array.isArray(v)) return false; break;
      case 'object': if (typeof v !== 'object' || v === null) return false; break;
      default: if (typeof v !== kind) return false;
    }
  }
  return true;
}

const HOST_TO_PANEL: Record<HostToPanel['type'], Shape> = {
  'profile': { uri: 'string', version: 'number', fileLabel: 'string', profile: 'object', settings: 'object' },
  'progress': { uri: 'string', version: 'number', fraction: 'number|null', message: 'string' },
  'failed': { uri: 'string', version: 'number', message: 'string' },
  'focus-column': { uri: 'string', column: 'string' },
  'bins-result': { uri: 'string', version: 'number', requestId: 'number', column: 'string', histogram: 'object|null', grouped: 'object|null', error: 'string?' },
  'groups-result': { uri: 'string', version: 'number', requestId: 'number', comparison: 'object|null', error: 'string?' },
};

const COPY_TARGETS: readonly string[] = ['summary', 'column', 'frequencies', 'grouped', 'groups', 'flags', 'report'];

const PANEL_TO_HOST: Record<PanelToHost['type'], Shape> = {
  'ready': {},
  'reveal': { uri: 'string', row: 'number', field: 'number|null' },
  'copy': { uri: 'string', version: 'number', target: 'string', column: 'string?', by: 'string?', bins: 'object?' },
  'request-bins': { uri: 'string', version: 'number', requestId: 'number', column: 'string', bins: 'object' },
  'request-groups': { uri: 'string', version: 'number', requestId: 'number', numeric: 'string', by: 'string' },
  'select-column': { uri: 'string', column: 'string|null' },
  'rendered': { uri: 'string', version: 'number', columns: 'array', rows: 'number', flags: 'number', partial: 'boolean' },
};

function isRecord(m: unknown): m is Record<string, unknown> {
  return typeof m === 'object' && m !== null && !Array.isArray(m);
}

/** Guard for messages arriving in the panel. */
export function isHostToPanel(m: unknown): m is HostToPanel {
  if (!isRecord(m) || typeof m.type !== 'string') return false;
  const shape = (HOST_TO_PANEL as Record<string, Shape | undefined>)[m.type];
  return shape !== undefined && matches(m, shape);
}

/** Guard for messages arriving in the host; a webview is untrusted input too. */
export function isPanelToHost(m: unknown): m is PanelToHost {
  if (!isRecord(m) || typeof m.type !== 'string') return false;
  const shape = (PANEL_TO_HOST as Record<string, Shape | undefined>)[m.type];
  if (shape === undefined || !matches(m, shape)) return false;
  if (m.type === 'copy' && !COPY_TARGETS.includes(m.target as string)) return false;
  if (m.type === 'reveal' && (!Number.isInteger(m.row) || (m.row as number) < 1)) return false;
  return true;
}
