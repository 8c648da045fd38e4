/**
 * The workbench's worker: every computation of the page runs here, with the
 * library's core and its bundled tables, so that the page stays responsive.
 * A user's own data file is merged over the built-in tables here and lives
 * only in this worker's memory.
 *
 * @module
 */
import { builtinDataset } from '../data/builtin.js';
import type { Dataset } from '../data/dataset.js';
import { isIonheatError } from '../error.js';
import { parseJsonStrict } from '../node/strictJson.js';
import { applyOverrideDocument } from '../node/overrideDocument.js';
import { enumerate } from '../screen/enumerate.js';
import { warmerSalts } from '../warmer/warmerMelt.js';
import { packView } from './packView.js';
import type { Answer, DataLoaded, Lists, Request } from './protocol.js';
import { saltView } from './saltView.js';
import { screenOutcome } from './screenView.js';
import { warmerView } from './warmerView.js';

/** The little of a worker's global scope this file uses. */
interface WorkerScope {
  onmessage: ((event: { data: { id: number } & Request }) => void) | null;
  postMessage(message: Answer): void;
}
const scope = globalThis as unknown as WorkerScope;

let dataset: Dataset = builtinDataset();

function lists(): Lists {
  return { warmerSalts: warmerSalts(dataset), dataLabel: dataset.label, builtinSalts: enumerate({}, dataset).length };
}

/** The problems of an error message that lists several (`3 problems: (1) …; (2) …`), one by one. */
function problemsOf(message: string): string[] {
  const at = message.indexOf('(1) ');
  if (at < 0) return [];
  return message
    .slice(at)
    .split(/;\s(?=\(\d+\) )/)
    .map((p) => p.replace(/^\(\d+\) /, ''));
}

function loadData(text: string, name: string): DataLoaded {
  const document = parseJsonStrict(text.replace(/^\uFEFF/, ''), name);
  const next = applyOverrideDocument(document, name, builtinDataset());
  const tables = Object.keys((document as { tables: Record<string, unknown[]> }).tables);
  const records = Object.values((document as { tables: Record<string, unknown[]> }).tables).reduce((n, r) => n + r.length, 0);
  dataset = next;
  return { label: next.label, records, tables };
}

async function answer(id: number, request: Request): Promise<Answer> {
  switch (request.kind) {
    case 'salt':
      return { id, kind: 'view', view: saltView(request.input, dataset) };
    case 'pack':
      return { id, kind: 'view', view: packView(request.input, dataset) };
    case 'warmer':
      return { id, kind: 'view', view: warmerView(request.input, dataset) };
    case 'screen': {
      const { csv, json, ...outcome } = await screenOutcome(request.input, dataset, (done, total) => scope.postMessage({ id, kind: 'progress', done, ...(total !== undefined ? { total } : {}) }));
      // The downloads go as blobs, passed by reference: megabytes of text would otherwise be copied on the page's thread.
      return { id, kind: 'screen', outcome, csv: new Blob([csv], { type: 'text/csv' }), json: new Blob([json], { type: 'application/json' }) };
    }
    case 'data':
      return { id, kind: 'data', loaded: loadData(request.input.text, request.input.name), lists: lists() };
    case 'clear-data':
      dataset = builtinDataset();
      return { id, kind: 'data', loaded: null, lists: lists() };
    case 'lists': {
      const answer: Answer = { id, kind: 'lists', lists: lists() };
      // After this answer is posted: the page is ready, and the warm-up runs while the person fills in a form.
      setTimeout(warmUp, 0);
      return answer;
    }
  }
}

/**
 * Salts of every basis, screened once when the page has loaded: the first computation builds the dataset's indexes
 * and calibrations, which later requests then find ready.
 */
const WARM_UP = ['KNO3', 'RbSCN', 'CsI', 'MgSO4·7H2O'];

let warmed = false;
function warmUp(): void {
  if (warmed) return;
  warmed = true;
  void screenOutcome({ source: { kind: 'text', text: `formula\n${WARM_UP.join('\n')}\n`, name: 'warm-up' }, fill: '40:80@22' }, dataset).catch(() => undefined);
}

scope.onmessage = (event) => {
  const { id, ...request } = event.data;
  answer(id, request as Request).then(
    (a) => scope.postMessage(a),
    (e: unknown) => {
      const message = e instanceof Error ? e.message : String(e);
      scope.postMessage({ id, kind: 'error', message, code: isIonheatError(e) ? e.code : 'INTERNAL', ...(isIonheatError(e) && e.field ? { field: e.field } : {}), problems: problemsOf(message) });
    },
  );
};
