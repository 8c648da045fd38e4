/**
 * Writing the rows of a screen as CSV, JSON, a text table or Markdown.
 * CSV and JSON are written row by row as the screen runs; the table formats
 * collect the rows first, to show their rank.
 *
 * @module
 */
import type { Estimate } from '../../quantity/estimate.js';
import { formulaText, formulasInText } from '../../notation/formula.js';
import { withTrueMinus } from '../../notation/minus.js';
import { wrapText } from '../../notation/wrapText.js';
import { formatEstimate, TEMPERATURE_RESOLUTION_K } from '../../quantity/formatEstimate.js';
import { compareRanked, isRankable, type RankKey } from '../../screen/rankRows.js';
import type { ScreenRow, ScreenSettings, ScreenSummary } from '../../screen/screenRow.js';
import { textTable, textTableLines } from '../cli/textTable.js';
import { escapeControls } from '../terminalText.js';
import { csvCell } from './csvCell.js';
import { csvRecord } from './csvRecord.js';
import { screenColumns } from './screenColumns.js';

/** A writer that turns rows into text as they come. */
export interface StreamWriter {
  start(): string;
  row(row: ScreenRow): string;
  end(summary: ScreenSummary): string;
}

/** CSV: a header of JSON field paths, one record per row ({@link csvRecord}, RFC 4180 quoting); text cells neutralised against formula injection ({@link csvCell}). */
export function csvWriter(settings: ScreenSettings, inputColumns?: readonly string[]): StreamWriter {
  const columns = screenColumns(settings, inputColumns);
  const cells: string[] = new Array<string>(columns.length);
  return {
    start: () => csvRecord(columns.map((c) => c.header)),
    row: (row) => {
      for (let i = 0; i < columns.length; i++) cells[i] = csvCell(columns[i]!.get(row));
      return csvRecord(cells);
    },
    end: () => '',
  };
}

/** JSON: one document `{ version, settings, rows: [...], summary }`, the rows written as they come. */
export function jsonWriter(settings: ScreenSettings): StreamWriter {
  let first = true;
  return {
    start: () => `{\n"version": 1,\n"settings": ${JSON.stringify(settings)},\n"rows": [\n`,
    row: (row) => {
      const text = (first ? '' : ',\n') + JSON.stringify(row);
      first = false;
      return text;
    },
    end: (summary) => `${first ? '' : '\n'}],\n"summary": ${JSON.stringify(summary)}\n}\n`,
  };
}

/** `34.89 [34.50, 35.28]`: value and 95 % interval with the decimals the uncertainty allows (a temperature to 0.01 K at finest). */
export function estimateText(e: Estimate | undefined, withUnit = false): string {
  if (!e) return '—';
  const f = formatEstimate(e, e.unit === '°C' ? { resolution: TEMPERATURE_RESOLUTION_K } : {});
  return `${f.value} [${f.low}, ${f.high}]${withUnit ? ` ${e.unit}` : ''}`;
}

function cellsOf(row: ScreenRow, settings: ScreenSettings, withCost: boolean): string[] {
  const status = row.status === 'failed' ? `failed: ${row.error?.message ?? ''}` : row.status === 'excluded' ? `left out: ${row.excludedBy ?? ''}` : '';
  const cells = [
    row.rank !== undefined ? String(row.rank) : '',
    String(row.line),
    row.status === 'failed' ? row.input.formula : (row.formula ?? row.input.formula),
    row.status === 'computed' ? estimateText(row.objective) : '',
    row.objective?.basis ?? '',
    row.status === 'computed' ? (row.verdict ?? '') : '',
  ];
  if (withCost) cells.push(estimateText(row.costPerKJ));
  cells.push(row.hazards && row.hazards.length > 0 ? row.hazards.join(', ') : row.hazardData === 'no hazard data' ? 'no hazard data' : row.hazardData === 'not classified' ? 'none classified' : '');
  if (settings.spec !== null) cells.push(row.spec ? (row.spec.holds ? 'holds' : `fails: ${row.spec.reason ?? ''}`) : '');
  const typo = row.suspectedTypo ? `suspected typo: did you mean ${row.suspectedTypo.suggestion}? (computed as written)` : '';
  const notes = [status, typo, row.duplicateOf !== undefined ? `same as line ${row.duplicateOf}` : '', row.input.note ?? ''].filter((s) => s !== '');
  cells.push(notes.join('; '));
  return cells;
}

function headerOf(settings: ScreenSettings, rows: readonly ScreenRow[], withCost: boolean): string[] {
  const unit = rows.find((r) => r.objective)?.objective?.unit;
  const header = ['rank', 'line', 'salt', `${settings.objective}${unit ? ` (${unit})` : ''} [95 %]`, 'basis', 'verdict'];
  if (withCost) header.push('cost per kJ [95 %]');
  header.push('hazards');
  if (settings.spec !== null) header.push('spec');
  header.push('notes');
  return header;
}

const CAUTION = 'Screening estimates: confirm by measurement; they defer to local codes, product-safety regulation and licensed practice. Hazard classes are from the hazards table; the safety data sheet of the material used takes precedence.';

/** Widest a screen's text table may be, characters: long cells are moved to notes below it. */
export const SCREEN_TABLE_COLUMNS = 120;

/** Longest cell kept in the table for the salt, the hazards and the spec; longer text becomes a numbered note. */
const CELL_LIMIT = { salt: 16, objective: 28, hazards: 22, spec: 6 } as const;

/**
 * A plain-text table of collected rows (in the order given), no wider than {@link SCREEN_TABLE_COLUMNS}: formulas
 * with subscripts, and every cell too long for its column (a long hazard list, why a spec fails, an error, a note)
 * moved below the table as a numbered note wrapped to `width`; then the caution.
 */
export function textTableOf(rows: readonly ScreenRow[], settings: ScreenSettings, width = 100): string {
  const withCost = rows.some((r) => r.input.pricePerKg !== undefined);
  const header = headerOf(settings, rows, withCost);
  header[header.length - 1] = 'see';
  const notes: string[] = [];
  const body = rows.map((r) => fitCells(cellsOf(r, settings, withCost), r.line, header, settings, notes));
  return `${textTable(header, body, new Set([0, 1]))}${notesBelow(notes, width)}\n${wrapText(CAUTION, width).join('\n')}\n`;
}

/** The numbered notes below a text table, wrapped to `width` (empty when there are none). */
function notesBelow(notes: readonly string[], width: number): string {
  return notes.length > 0 ? `\n${notes.flatMap((n) => wrapText(formulasInText(n), width, '', '    ')).join('\n')}\n` : '';
}

/**
 * One row's cells fitted to the text table: formulas with subscripts, true minus signs, and every cell too long for
 * its column (a long hazard list, why a spec fails, an error, a note) moved to a numbered note in `notes`.
 */
function fitCells(raw: readonly string[], line: number, header: readonly string[], settings: ScreenSettings, notes: string[]): string[] {
  const hazardsAt = header.indexOf('hazards');
  const specAt = settings.spec !== null ? header.indexOf('spec') : -1;
  const cells = raw.map((c) => withTrueMinus(c));
  const moved: string[] = [];
  const salt = cells[2]!;
  cells[2] = formulaText(salt);
  if ([...salt].length > CELL_LIMIT.salt) {
    moved.push(`salt ${salt}`);
    cells[2] = `${[...salt].slice(0, CELL_LIMIT.salt - 1).join('')}…`;
  }
  if ([...cells[3]!].length > CELL_LIMIT.objective) {
    moved.push(`${settings.objective} ${cells[3]}`);
    cells[3] = `${[...cells[3]!.split(' [')[0]!].slice(0, CELL_LIMIT.objective - 2).join('')} …`;
  }
  if ([...cells[hazardsAt]!].length > CELL_LIMIT.hazards) {
    moved.push(`hazards: ${cells[hazardsAt]}`);
    cells[hazardsAt] = `${cells[hazardsAt]!.split(', ')[0]}, …`;
  }
  if (specAt >= 0 && [...cells[specAt]!].length > CELL_LIMIT.spec) {
    moved.push(`spec ${cells[specAt]}`);
    cells[specAt] = cells[specAt]!.startsWith('fails') ? 'fails' : cells[specAt]!.slice(0, CELL_LIMIT.spec);
  }
  const last = cells.length - 1;
  if (cells[last] !== '') moved.push(cells[last]!);
  cells[last] = '';
  if (moved.length > 0) {
    notes.push(`[${notes.length + 1}] line ${line}: ${moved.join('; ')}`);
    cells[last] = `[${notes.length}]`;
  }
  return cells;
}

/** The header and cells of the screen's table for collected rows (in the order given), as the Markdown table has them; the workbench page shows the same cells. */
export function screenTableCells(rows: readonly ScreenRow[], settings: ScreenSettings): { header: string[]; body: string[][]; caution: string } {
  const withCost = rows.some((r) => r.input.pricePerKg !== undefined);
  return { header: headerOf(settings, rows, withCost), body: rows.map((r) => cellsOf(r, settings, withCost)), caution: CAUTION };
}

/** A Markdown table of collected rows, with the caution below it. */
export function markdownTableOf(rows: readonly ScreenRow[], settings: ScreenSettings): string {
  const withCost = rows.some((r) => r.input.pricePerKg !== undefined);
  const header = headerOf(settings, rows, withCost);
  return [...markdownLines(header, rows.map((r) => cellsOf(r, settings, withCost)))].join('');
}

/** A Markdown table, a line at a time (each with its line end), the caution after it. */
function* markdownLines(header: readonly string[], body: Iterable<readonly string[]>): Generator<string> {
  const cell = (s: string) => escapeControls(s.replace(/\\/g, '\\\\').replace(/\|/g, '\\|').replace(/[\r\n]+/g, ' '));
  yield `| ${header.map(cell).join(' | ')} |\n`;
  yield `| ${header.map((_, i) => (i <= 1 ? '---:' : '---')).join(' | ')} |\n`;
  for (const cells of body) yield `| ${cells.map(cell).join(' | ')} |\n`;
  yield `\n${CAUTION}\n`;
}

/** What a ranked table keeps of a row: its rank key and its cells (all columns but the rank), joined by NUL. */
interface TableEntry extends RankKey {
  rankable: boolean;
  cells: string;
}

/** A ranked table built from rows as they come, keeping of each only its cells and what ranking needs. */
export interface RankedTable {
  add(row: ScreenRow): void;
  /** The table's text, a line (or a few) at a time, rows ranked best first; unranked rows after, in input order. */
  text(): Generator<string>;
}

/**
 * Collects rows for the `table` and `md` formats. A row is reduced to its
 * cells at once (control characters made visible, so NUL can join them), so
 * a run of any length holds about a hundred bytes per row, never the rows.
 */
export function rankedTable(settings: ScreenSettings, format: 'table' | 'md', width = 100): RankedTable {
  const entries: TableEntry[] = [];
  let withCost = false;
  let unit: string | undefined;
  return {
    add(row) {
      if (row.input.pricePerKg !== undefined) withCost = true;
      unit ??= row.objective?.unit;
      const { rank: _ignored, ...unranked } = row;
      const cells = cellsOf(unranked, settings, true).slice(1).map((c) => escapeControls(c)).join('\u0000');
      const rankable = isRankable(row);
      entries.push({ line: row.line, suitability: row.suitability, objective: rankable ? { value: row.objective!.value } : undefined, rankable, cells });
    },
    *text() {
      const order = entries.filter((e) => e.rankable).sort((a, b) => compareRanked(a, b, settings.objective, settings.direction));
      const rankOf = new Map<TableEntry, number>(order.map((e, i) => [e, i + 1]));
      const costAt = 5; // the cost column follows rank, line, salt, objective, basis, verdict (rank left out here)
      const rowsInOrder = [...order, ...entries.filter((e) => !e.rankable)];
      entries.length = 0;
      const header = headerOf(settings, unit ? [{ objective: { unit } } as ScreenRow] : [], withCost);
      if (format === 'table') header[header.length - 1] = 'see';
      const notes: string[] = [];
      function* body(): Generator<string[]> {
        notes.length = 0; // the table reads the body twice (widths, then lines): number the notes afresh each time
        for (const e of rowsInOrder) {
          const cells = e.cells.split('\u0000');
          if (!withCost) cells.splice(costAt, 1);
          const all = [rankOf.has(e) ? String(rankOf.get(e)) : '', ...cells];
          yield format === 'table' ? fitCells(all, e.line, header, settings, notes) : all;
        }
      }
      if (format === 'md') yield* markdownLines(header, body());
      else {
        for (const line of textTableLines(header, body, new Set([0, 1]))) yield `${line}\n`;
        yield `${notesBelow(notes, width)}\n${wrapText(CAUTION, width).join('\n')}\n`;
      }
    },
  };
}

/** The one-line summary of a run. */
export function summaryLine(summary: ScreenSummary, hasSpec: boolean): string {
  const parts = [`${summary.read} row${summary.read === 1 ? '' : 's'} read`, `${summary.computed} computed`, `${summary.failed} failed`];
  if (summary.excluded > 0) parts.push(`${summary.excluded} left out`);
  if (hasSpec) parts.push(`spec held for ${summary.specHeld}, failed for ${summary.specFailed}`);
  const blank = summary.blankLines > 0 ? ` (${summary.blankLines} blank line${summary.blankLines === 1 ? '' : 's'} skipped)` : '';
  return `screen: ${parts.join(', ')}${blank}`;
}
