/**
 * The messages between the page and its worker. The page sends a request
 * with an id; the worker answers with the same id, once, with a result or
 * an error (and, for a screen, progress before it).
 *
 * @module
 */
import type { PackRequest } from './packView.js';
import type { SaltRequest } from './saltView.js';
import type { ScreenRequest, ScreenOutcome } from './screenView.js';
import type { PanelView } from './view.js';
import type { WarmerFill } from '../warmer/latentWarmer.js';

export type Request =
  | { kind: 'salt'; input: SaltRequest }
  | { kind: 'pack'; input: PackRequest }
  | { kind: 'warmer'; input: WarmerFill }
  | { kind: 'screen'; input: ScreenRequest }
  | { kind: 'data'; input: { text: string; name: string } }
  | { kind: 'clear-data'; input: null }
  | { kind: 'lists'; input: null };

/** The lists the forms offer: warmer hydrates, and the dataset in use. */
export interface Lists {
  warmerSalts: string[];
  dataLabel: string;
  builtinSalts: number;
}

export interface DataLoaded {
  label: string;
  records: number;
  tables: string[];
}

export type Answer =
  | { id: number; kind: 'view'; view: PanelView }
  | { id: number; kind: 'screen'; outcome: Omit<ScreenOutcome, 'csv' | 'json'>; csv: Blob; json: Blob }
  | { id: number; kind: 'data'; loaded: DataLoaded | null; lists: Lists }
  | { id: number; kind: 'lists'; lists: Lists }
  | { id: number; kind: 'progress'; done: number; total?: number }
  | { id: number; kind: 'error'; message: string; code: string; field?: string; problems: string[] };
