/**
 * `ionheat screen`: rank a list of candidate salts (or every salt of the
 * built-in ions) for a hot or cold pack, check them against a
 * specification, and write a table, CSV, JSON, Markdown and a chart.
 *
 * @module
 */
import { constants as osConstants } from 'node:os';
import { Readable } from 'node:stream';
import { IonheatError } from '../../error.js';
import { intervalChart } from '../../render/intervalChart.js';
import { specThresholds } from '../../screen/specThresholds.js';
import { createScreener } from '../../screen/createScreener.js';
import { enumerate } from '../../screen/enumerate.js';
import { parseFillSpec } from '../../screen/parseFillSpec.js';
import { compareRanked, isRankable, rankRows } from '../../screen/rankRows.js';
import { checkOutputTarget, fileIdentity, writeFileSafely } from '../writeFileSafely.js';
import { escapeControls } from '../terminalText.js';
import { objectiveNameSchema, type ObjectiveName, type ScreenRow } from '../../screen/screenRow.js';
import { readArgs } from './args.js';
import { outputWidth } from './io.js';
import type { Command } from './command.js';
import { openCandidates, type InputRecord } from '../table/readCandidateRows.js';
import { csvWriter, jsonWriter, rankedTable, summaryLine, type StreamWriter } from '../table/screenWriters.js';
import { silentProgress, terminalProgress } from '../table/progressBar.js';

const FORMATS = ['table', 'csv', 'json', 'md'] as const;
type Format = (typeof FORMATS)[number];

/** Most candidates drawn in the chart of a streamed screen (the best ones). */
const CHART_ROWS = 100;
/** Output is passed on in pieces of about this many characters. */
const FLUSH_AT = 1 << 16;

const usage = `ionheat screen <file.csv|file.json|-> [options]
ionheat screen --enumerate [options]

  <file>                 candidates: CSV with a header (a "formula" column; optional
                         measuredEnthalpy, measuredUncertainty, solubility, pricePerKg,
                         source, note), or JSON (an array of such rows or of formulas);
                         - reads standard input
  --enumerate            screen every charge-balanced salt of the built-in ions instead
  --objective <name>     what to rank by: enthalpy (kJ/mol, default), heat-per-gram (J/g),
                         fill-temperature (°C, needs --fill), cost-per-kj (needs pricePerKg);
                         for latent-heat warmers (100 g of hydrate triggered at 20 °C):
                         plateau-temperature (°C), warmer-heat-per-gram (J/g), plateau-duration (s)
  --direction cool|heat  the pack to design (default cool)
  --fill <s>:<w>@<t>     standard fill: grams of salt, grams of water, start °C, e.g. 40:80@22
  --spec "<condition>"   a condition every row must meet, on the fields of the JSON output,
                         e.g. "best.low > 0 and not ('oxidizer' in hazards)"
  --format <f>           table (default), csv, json or md; csv and json stream in input order
  --json                 the same as --format json
  --svg <file>           also write the ranked interval chart as SVG
  --exclude-measured     hide each salt's own measured values (see how the estimates do)

Every input row gives one output row, in input order, with its line number; rows that
cannot be computed (or read: an unclosed quote, an over-long record) carry their error.
Output waits for a slow reader; a reader that stops early (| head) stops the output but
not the screen. A summary line goes to standard error once the output is written.
Ctrl-C (SIGINT, or SIGTERM, SIGHUP) stops reading and writes the rows computed so far
(status 128 + the signal's number, 130 for Ctrl-C); a second one ends at once.
Exit status: 0 all rows computed and the spec holds for all; 1 the spec fails for
some row; 2 unusable arguments, an unreadable file, or a row that could not be computed
(a chart that cannot be written gives 2 unless the spec failed, which gives 1).`;

/** `ionheat screen`. */
export const screenCommand: Command = {
  usage,
  async run(argv, { io, dataset, inputFiles = [] }) {
    const { values, positionals } = readArgs(
      argv,
      {
        enumerate: { type: 'boolean' },
        objective: { type: 'string' },
        direction: { type: 'string' },
        fill: { type: 'string' },
        spec: { type: 'string' },
        format: { type: 'string' },
        svg: { type: 'string' },
        'exclude-measured': { type: 'boolean' },
        json: { type: 'boolean' },
      },
      { min: 0, max: 1, names: 'the candidate file (or - for standard input, or --enumerate)' },
    );
    const path = positionals[0];
    if (path === undefined && !values.enumerate) throw new IonheatError('INVALID_ARGUMENT', 'missing the candidate file (a .csv or .json file, - for standard input, or --enumerate)', {});
    if (path !== undefined && values.enumerate) throw new IonheatError('INVALID_ARGUMENT', 'give either a candidate file or --enumerate, not both', {});
    if (values.json && values.format !== undefined && values.format !== 'json') throw new IonheatError('INVALID_ARGUMENT', `--json asks for JSON output but --format asks for ${values.format}; give one of them`, { field: 'format' });
    const format = (values.format ?? (values.json ? 'json' : 'table')) as Format;
    if (!FORMATS.includes(format)) throw new IonheatError('INVALID_ARGUMENT', `--format must be one of ${FORMATS.join(', ')}, got "${values.format}"`, { field: 'format' });
    if (values.objective !== undefined && !objectiveNameSchema.safeParse(values.objective).success) {
      throw new IonheatError('INVALID_ARGUMENT', `--objective must be one of ${objectiveNameSchema.options.join(', ')}, got "${values.objective}"`, { field: 'objective' });
    }
    if (values.direction !== undefined && values.direction !== 'cool' && values.direction !== 'heat') {
      throw new IonheatError('INVALID_ARGUMENT', `--direction must be cool or heat, got "${values.direction}"`, { field: 'direction' });
    }
    if (values.svg !== undefined && values.svg.trim() === '') throw new IonheatError('INVALID_ARGUMENT', '--svg needs a file name', { field: 'svg' });
    if (values.objective === 'cost-per-kj' && path === undefined) {
      throw new IonheatError('INVALID_ARGUMENT', '--objective cost-per-kj ranks by price, and --enumerate has no prices: give a candidate file with a pricePerKg column', { field: 'objective' });
    }
    const fill = values.fill !== undefined ? parseFillSpec(values.fill) : undefined;
    const objective = (values.objective as ObjectiveName | undefined) ?? (fill ? 'fill-temperature' : 'enthalpy');
    const screener = createScreener(
      {
        objective,
        ...(values.direction ? { direction: values.direction as 'cool' | 'heat' } : {}),
        ...(fill ? { fill } : {}),
        ...(values.spec !== undefined ? { spec: values.spec } : {}),
        excludeMeasured: values['exclude-measured'] === true,
      },
      dataset,
    );
    const { settings } = screener;

    // Where the candidates come from.
    let records: AsyncIterable<InputRecord[]> | Iterable<InputRecord[]>;
    let progressOf: () => { bytes: number; total?: number } = () => ({ bytes: 0 });
    let inputColumns: () => readonly string[] | undefined = () => ['formula'];
    let inputFile: { dev: number; ino: number } | undefined;
    if (path === undefined) {
      const salts = enumerate({}, dataset);
      records = [salts.map((salt, i): InputRecord => ({ kind: 'candidate', line: i + 1, candidate: salt }))];
      progressOf = () => ({ bytes: 0, total: salts.length });
    } else {
      const stdin = path === '-' ? (io.stdinStream ? (io.stdinStream() as Readable) : Readable.from([await io.readStdin()])) : Readable.from([]);
      const source = await openCandidates(path, io.cwd, stdin);
      records = source.records;
      progressOf = source.progress;
      inputColumns = source.columns;
      inputFile = source.file;
    }

    // Where the chart goes: checked before any work, never over an input.
    const chartTarget = values.svg === undefined ? undefined : values.svg.startsWith('/') ? values.svg : `${io.cwd}/${values.svg}`;
    if (chartTarget !== undefined) checkOutputTarget(chartTarget, '--svg', [inputFile, ...inputFiles.map(fileIdentity)]);

    // Where the rows go. Output is handed on in pieces of FLUSH_AT characters, each awaited (a slow reader holds the screen back, not memory).
    const streaming = format === 'csv' || format === 'json';
    // The CSV writer starts once the input's header is known, so that it can leave out columns the input cannot fill.
    let writer: StreamWriter | undefined;
    const table = streaming ? undefined : rankedTable(settings, format === 'md' ? 'md' : 'table', outputWidth(io));
    const gone = () => io.stdoutGone?.();
    let pending = '';
    const startWriter = () => {
      if (writer || !streaming) return;
      writer = format === 'csv' ? csvWriter(settings, inputColumns()) : jsonWriter(settings);
      pending += writer.start();
    };
    const flush = async () => {
      const text = pending;
      pending = '';
      if (text !== '' && !gone()) await io.stdout(text);
      // A turn of the event loop, so that a signal (Ctrl-C) is seen even while every write completes at once.
      if (io.interrupted) await new Promise<void>((resolve) => setImmediate(resolve));
    };
    let best: ScreenRow[] = [];
    const keepForChart = (row: ScreenRow) => {
      if (!isRankable(row)) return;
      best.push(row);
      if (best.length >= CHART_ROWS * 2) best = best.sort((a, b) => compareRanked(a, b, settings.objective, settings.direction)).slice(0, CHART_ROWS);
    };
    const progress = io.stderrIsTTY ? terminalProgress((t) => io.stderr(t)) : silentProgress;

    let count = 0;
    let fatal: unknown;
    let pricedAny = false;
    try {
      for await (const batch of records as AsyncIterable<InputRecord[]>) {
        if (io.interrupted?.()) break;
        for (const record of batch) {
          if (record.kind === 'blank') {
            screener.blankLine();
            continue;
          }
          startWriter();
          const row = record.kind === 'candidate' ? screener.row(record.candidate, record.line) : screener.unreadable(record.line, { formula: record.formula ?? '' }, record.error);
          if (row.costPerKJ !== undefined) pricedAny = true;
          // With the reader gone the rows are still computed (the exit status depends on them), but not written.
          if (!gone()) {
            if (writer) pending += writer.row(row);
            else table!.add(row);
          }
          if (chartTarget !== undefined) keepForChart(row);
          if (pending.length >= FLUSH_AT) {
            await flush();
            if (io.interrupted?.()) break;
          }
          count++;
          if ((count & 255) === 0) {
            const p = progressOf();
            progress.update(count, p.total ? (path === undefined ? count / p.total : p.bytes / p.total) : undefined);
          }
        }
      }
    } catch (e) {
      // Nothing written yet (a bad header, an unreadable file): the error alone. Else what was computed is written first.
      if (count === 0) throw e;
      fatal = e;
    } finally {
      progress.done();
    }
    const signal = io.interrupted?.();
    if (signal !== undefined && fatal === undefined) fatal = new IonheatError('INVALID_ARGUMENT', `stopped by ${signal} after ${count} row${count === 1 ? '' : 's'}`);
    const summary = screener.summary();
    startWriter();
    if (writer) pending += writer.end(summary);
    await flush();
    if (table && !gone()) {
      for (const text of table.text()) {
        pending += text;
        if (pending.length >= FLUSH_AT) await flush();
      }
      await flush();
    }

    let chartFailure: IonheatError | undefined;
    if (chartTarget !== undefined && fatal === undefined) {
      const rows = rankRows(best.sort((a, b) => compareRanked(a, b, settings.objective, settings.direction)).slice(0, CHART_ROWS), settings.objective, settings.direction);
      const svg = intervalChart({ settings, rows, summary }, { maxRows: CHART_ROWS, marks: specThresholds(settings.spec, settings.objective) });
      try {
        writeFileSafely(chartTarget, svg, 'the chart', '--svg');
      } catch (e) {
        if (!(e instanceof IonheatError)) throw e;
        chartFailure = e;
      }
    }
    // The summary last, once the output is written: it must not claim rows the reader never got.
    const stopped = gone();
    io.stderr(`${summaryLine(summary, settings.spec !== null)}${stopped ? `; output stopped early (${stopped})` : ''}\n`);
    if (fatal !== undefined) {
      io.stderr(`ionheat: ${escapeControls(fatal instanceof Error ? fatal.message : String(fatal))}; the rows before it were written\n`);
      return signal !== undefined ? 128 + (osConstants.signals[signal] ?? 0) : 2;
    }
    if (chartFailure) io.stderr(`ionheat: ${escapeControls(chartFailure.message)}\n`);
    if (settings.objective === 'cost-per-kj' && !pricedAny) {
      io.stderr('ionheat: --objective cost-per-kj needs a pricePerKg for the candidates, and no row had one; nothing was ranked (add a pricePerKg column, or rank by another objective)\n');
      return 2;
    }
    if (summary.failed > 0) return 2;
    if (summary.specFailed > 0) return 1;
    return chartFailure ? 2 : 0;
  },
};
