/**
 * `ionheat screen`: rank a list of candidate salts (or every salt of the
 * built-in ions) for a hot or cold pack, check them against a
 * specification, and write a table, CSV, JSON, Markdown and a chart.
 *
 * @module
 */
import { writeFileSync } from 'node:fs';
import { Readable } from 'node:stream';
import { IonheatError } from '../../error.js';
import { intervalChart } from '../../render/intervalChart.js';
import { specThresholds } from '../../screen/specThresholds.js';
import { createScreener } from '../../screen/createScreener.js';
import { enumerate } from '../../screen/enumerate.js';
import { parseFillSpec } from '../../screen/parseFillSpec.js';
import { compareRanked, isRankable, rankRows } from '../../screen/rankRows.js';
import { objectiveNameSchema, type ObjectiveName, type ScreenRow } from '../../screen/screenRow.js';
import { readArgs } from './args.js';
import { outputWidth } from './io.js';
import type { Command } from './command.js';
import { openCandidates, type InputRecord } from '../table/readCandidateRows.js';
import { csvWriter, jsonWriter, markdownTableOf, summaryLine, textTableOf, type StreamWriter } from '../table/screenWriters.js';
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
  --svg <file>           also write the ranked interval chart as SVG
  --exclude-measured     hide each salt's own measured values (see how the estimates do)

Every input row gives one output row, in input order, with its line number; rows that
cannot be computed carry their error. A summary line goes to standard error.
Exit status: 0 all rows computed and the spec holds for all; 1 the spec fails for
some row; 2 unusable arguments, an unreadable file, or a row that could not be computed.`;

/** `ionheat screen`. */
export const screenCommand: Command = {
  name: 'screen',
  summary: 'rank candidate salts for a hot or cold pack and check them against a specification',
  usage,
  async run(argv, { io, dataset }) {
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
      },
      { min: 0, max: 1, names: 'the candidate file (or - for standard input, or --enumerate)' },
    );
    const path = positionals[0];
    if (path === undefined && !values.enumerate) throw new IonheatError('INVALID_ARGUMENT', 'missing the candidate file (a .csv or .json file, - for standard input, or --enumerate)', {});
    if (path !== undefined && values.enumerate) throw new IonheatError('INVALID_ARGUMENT', 'give either a candidate file or --enumerate, not both', {});
    const format = (values.format ?? 'table') as Format;
    if (!FORMATS.includes(format)) throw new IonheatError('INVALID_ARGUMENT', `--format must be one of ${FORMATS.join(', ')}, got "${values.format}"`, { field: 'format' });
    if (values.objective !== undefined && !objectiveNameSchema.safeParse(values.objective).success) {
      throw new IonheatError('INVALID_ARGUMENT', `--objective must be one of ${objectiveNameSchema.options.join(', ')}, got "${values.objective}"`, { field: 'objective' });
    }
    if (values.direction !== undefined && values.direction !== 'cool' && values.direction !== 'heat') {
      throw new IonheatError('INVALID_ARGUMENT', `--direction must be cool or heat, got "${values.direction}"`, { field: 'direction' });
    }
    if (values.svg !== undefined && values.svg.trim() === '') throw new IonheatError('INVALID_ARGUMENT', '--svg needs a file name', { field: 'svg' });
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
    }

    // Where the rows go.
    const streaming = format === 'csv' || format === 'json';
    // The CSV writer starts once the input's header is known, so that it can leave out columns the input cannot fill.
    let writer: StreamWriter | undefined;
    const startWriter = () => {
      if (writer || !streaming) return;
      writer = format === 'csv' ? csvWriter(settings, inputColumns()) : jsonWriter(settings);
      emit(writer.start());
    };
    let pending = '';
    const emit = (text: string) => {
      pending += text;
      if (pending.length >= FLUSH_AT) {
        io.stdout(pending);
        pending = '';
      }
    };
    const collected: ScreenRow[] = [];
    let best: ScreenRow[] = [];
    const keepForChart = (row: ScreenRow) => {
      if (!isRankable(row)) return;
      best.push(row);
      if (best.length >= CHART_ROWS * 2) best = best.sort((a, b) => compareRanked(a, b, settings.objective, settings.direction)).slice(0, CHART_ROWS);
    };
    const progress = io.stderrIsTTY ? terminalProgress((t) => io.stderr(t)) : silentProgress;

    let count = 0;
    try {
      for await (const batch of records as AsyncIterable<InputRecord[]>) for (const record of batch) {
        if (record.kind === 'blank') {
          screener.blankLine();
          continue;
        }
        startWriter();
        const row = record.kind === 'candidate' ? screener.row(record.candidate, record.line) : screener.unreadable(record.line, { formula: record.formula ?? '' }, record.error);
        if (writer) {
          emit(writer.row(row));
          if (values.svg !== undefined) keepForChart(row);
        } else collected.push(row);
        count++;
        if ((count & 255) === 0) {
          const p = progressOf();
          progress.update(count, p.total ? (path === undefined ? count / p.total : p.bytes / p.total) : undefined);
        }
      }
    } finally {
      progress.done();
    }
    const summary = screener.summary();
    startWriter();
    if (writer) emit(writer.end(summary));
    else {
      const ranked = rankRows(collected, settings.objective, settings.direction);
      emit(format === 'md' ? markdownTableOf(ranked, settings) : textTableOf(ranked, settings, outputWidth(io)));
      collected.length = 0;
      best = ranked;
    }
    if (pending) io.stdout(pending);
    pending = '';

    if (values.svg !== undefined) {
      const rows = streaming ? rankRows(best.sort((a, b) => compareRanked(a, b, settings.objective, settings.direction)).slice(0, CHART_ROWS), settings.objective, settings.direction) : best;
      const svg = intervalChart({ settings, rows, ...(streaming ? { summary } : {}) }, { maxRows: CHART_ROWS, marks: specThresholds(settings.spec, settings.objective) });
      const target = values.svg.startsWith('/') ? values.svg : `${io.cwd}/${values.svg}`;
      try {
        writeFileSync(target, svg);
      } catch (e) {
        throw new IonheatError('INVALID_ARGUMENT', `cannot write the chart to "${values.svg}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`, { field: 'svg' });
      }
    }
    io.stderr(`${summaryLine(summary, settings.spec !== null)}\n`);
    if (summary.failed > 0) return 2;
    if (summary.specFailed > 0) return 1;
    return 0;
  },
};
