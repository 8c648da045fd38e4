/**
 * The Screen panel: candidates from a pasted or uploaded CSV (or JSON) list,
 * or every salt of the built-in ions, run through the same screener, reader
 * and writers as `ionheat screen`, so that the CSV and JSON offered for
 * download are the command line's, byte for byte.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { IonheatError } from '../error.js';
import { createScreener } from '../screen/createScreener.js';
import { enumerate } from '../screen/enumerate.js';
import { parseFillSpec } from '../screen/parseFillSpec.js';
import { compareRanked, isRankable, rankRows } from '../screen/rankRows.js';
import { specThresholds } from '../screen/specThresholds.js';
import { objectiveNameSchema, type Direction, type ObjectiveName, type ScreenRow, type ScreenSummary } from '../screen/screenRow.js';
import { intervalChart } from '../render/intervalChart.js';
import { csvCandidateRecords, jsonCandidateRecords, type InputRecord } from '../node/table/candidateRecords.js';
import { csvWriter, jsonWriter, screenTableCells, summaryLine } from '../node/table/screenWriters.js';
import { panelView, type PanelView } from './view.js';

/** What the Screen panel asks. */
export interface ScreenRequest {
  /** Candidate text (CSV, or JSON when it starts with `[` or `{`) and the file name it came from; or every built-in salt. */
  source: { kind: 'text'; text: string; name: string } | { kind: 'enumerate' };
  /** Default: fill-temperature with a fill, else enthalpy (as on the command line). */
  objective?: ObjectiveName;
  direction?: Direction;
  /** `<salt g>:<water g>@<start °C>`, e.g. 40:80@22. */
  fill?: string;
  spec?: string;
}

/** The panel's view, the rows for the table, and the two downloads. */
export interface ScreenOutcome {
  view: PanelView;
  summary: ScreenSummary;
  csv: string;
  json: string;
  /** How many rows were computed per second in the worker. */
  elapsedMs: number;
}

/** Most candidates drawn in the chart (the best ones), as on the command line. */
const CHART_ROWS = 100;

async function* once<T>(value: T): AsyncGenerator<T> {
  yield value;
}

/** Runs a screen; `progress` hears the count of rows done now and then. */
export async function screenOutcome(request: ScreenRequest, dataset: Dataset, progress: (done: number, total?: number) => void = () => {}): Promise<ScreenOutcome> {
  const began = Date.now();
  if (request.objective !== undefined && !objectiveNameSchema.safeParse(request.objective).success) throw new IonheatError('INVALID_ARGUMENT', `the objective must be one of ${objectiveNameSchema.options.join(', ')}, got "${request.objective}"`, { field: 'objective' });
  const fill = request.fill !== undefined && request.fill.trim() !== '' ? parseFillSpec(request.fill.trim()) : undefined;
  const spec = request.spec !== undefined && request.spec.trim() !== '' ? request.spec : undefined;
  const objective = request.objective ?? (fill ? 'fill-temperature' : 'enthalpy');
  if (objective === 'cost-per-kj' && request.source.kind === 'enumerate') throw new IonheatError('INVALID_ARGUMENT', 'ranking by cost per kJ needs a pricePerKg for each candidate, and the built-in salts have no prices: give a candidate list with a pricePerKg column', { field: 'objective' });
  const screener = createScreener({ objective, ...(request.direction ? { direction: request.direction } : {}), ...(fill ? { fill } : {}), ...(spec !== undefined ? { spec } : {}), excludeMeasured: false }, dataset);
  const { settings } = screener;
  let records: AsyncIterable<InputRecord[]>;
  let total: number | undefined;
  let columns: () => readonly string[] | undefined = () => ['formula'];
  if (request.source.kind === 'enumerate') {
    const salts = enumerate({}, dataset);
    total = salts.length;
    records = once(salts.map((salt, i): InputRecord => ({ kind: 'candidate', line: i + 1, candidate: salt })));
  } else {
    const { text, name } = request.source;
    // As the command line decides: by the file's extension, else (pasted text) by its first character.
    const lower = name.toLowerCase();
    const first = text.replace(/^\uFEFF/, '').trimStart()[0];
    const json = lower.endsWith('.json') || (!lower.endsWith('.csv') && !lower.endsWith('.txt') && (first === '[' || first === '{'));
    if (json) {
      records = jsonCandidateRecords(text.replace(/^\uFEFF/, ''), name);
      columns = () => undefined;
    } else {
      const counter: { columns?: string[] } = {};
      records = csvCandidateRecords(once(text), name, counter);
      columns = () => counter.columns;
    }
  }
  const rows: ScreenRow[] = [];
  let csv = '';
  let json = '';
  let csvOut: ReturnType<typeof csvWriter> | undefined;
  const jsonOut = jsonWriter(settings);
  for await (const batch of records) {
    for (const record of batch) {
      if (record.kind === 'blank') {
        screener.blankLine();
        continue;
      }
      if (!csvOut) {
        csvOut = csvWriter(settings, columns());
        csv += csvOut.start();
        json += jsonOut.start();
      }
      const row = record.kind === 'candidate' ? screener.row(record.candidate, record.line) : screener.unreadable(record.line, { formula: record.formula ?? '' }, record.error);
      rows.push(row);
      csv += csvOut.row(row);
      json += jsonOut.row(row);
      if ((rows.length & 63) === 0) progress(rows.length, total);
    }
  }
  const summary = screener.summary();
  if (!csvOut) {
    csvOut = csvWriter(settings, columns());
    csv += csvOut.start();
    json += jsonOut.start();
  }
  csv += csvOut.end(summary);
  json += jsonOut.end(summary);

  const ranked = rankRows(rows, settings.objective, settings.direction);
  const inOrder = [...ranked.filter(isRankable).sort((a, b) => compareRanked(a, b, settings.objective, settings.direction)), ...ranked.filter((r) => !isRankable(r))];
  const view = panelView(`Screen: ${request.source.kind === 'enumerate' ? 'every salt of the built-in ions' : request.source.name}`);
  const cells = screenTableCells(inOrder, settings);
  view.cautions.push({ severity: 'notice', text: cells.caution });
  view.lines.push(summaryLine(summary, settings.spec !== null));
  view.tables.push({ caption: 'Ranked candidates (click a column heading to sort; rows that could not be computed keep their error)', header: cells.header, rows: cells.body, numeric: [0, 1] });
  const best = inOrder.filter(isRankable).slice(0, CHART_ROWS);
  if (best.length > 0) view.charts.push({ title: 'Ranked 95 % intervals', svg: intervalChart({ settings, rows: best, summary }, { maxRows: CHART_ROWS, marks: specThresholds(settings.spec, settings.objective) }) });
  return { view, summary, csv, json, elapsedMs: Date.now() - began };
}
