/**
 * `ionheat demo`: the demonstration scenario of docs/examples/. A first-aid
 * supplier wants a single-use cold pack without ammonium nitrate that reaches
 * 5 °C or below from 22 °C with at most 120 g of fill, and a hand-warmer salt
 * that stays under the contact-burn threshold. Every price, note and the one
 * "in-house measurement" of the candidate lists is invented for the demo
 * (source key `inventedDemo`); the chemistry comes from the built-in tables.
 *
 * @module
 */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { stringify } from 'csv-stringify/sync';
import { IonheatError } from '../../error.js';
import type { Dataset } from '../../data/dataset.js';
import { CONTACT_BURN_THRESHOLD_C } from '../../pack/packCautions.js';
import { intervalChart, type ChartMark } from '../../render/intervalChart.js';
import { candidateFields, type CandidateInput } from '../../screen/candidate.js';
import { screen, type ScreenResult } from '../../screen/screen.js';
import type { ScreenOptions } from '../../screen/createScreener.js';
import type { ScreenRow } from '../../screen/screenRow.js';
import { readArgs } from './args.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';
import { estimateText, markdownTableOf } from '../table/screenWriters.js';

/** One part of the demonstration: a candidate list and how it is screened. */
export interface DemoPart {
  /** File stem under docs/examples/ (`cold-pack`). */
  name: string;
  title: string;
  /** What the supplier asks for, in words. */
  brief: string;
  candidates: CandidateInput[];
  options: ScreenOptions & { fill: string; spec: string };
  /** Reference lines for the chart. */
  marks: ChartMark[];
}

const INVENTED_PRICE = 'price invented for the demo';

/** The cold pack: a 120 g single-use fill, 60 g of salt in 60 g of water, from 22 °C. */
const coldPack: DemoPart = {
  name: 'cold-pack',
  title: 'Single-use cold pack without ammonium nitrate',
  brief: 'reach 5 °C or below (the whole 95 % interval) from 22 °C with a 120 g fill: 60 g of salt in 60 g of water; ammonium nitrate is ruled out',
  candidates: [
    { formula: 'NH4NO3', pricePerKg: 0.9, note: `today's salt, to be replaced; ${INVENTED_PRICE}` },
    { formula: 'CO(NH2)2', pricePerKg: 0.6, note: INVENTED_PRICE },
    { formula: 'CO(NH2)2', measuredEnthalpy: 15.3, measuredUncertainty: 0.3, source: 'inventedDemo', pricePerKg: 0.7, note: 'lot B with the supplier’s own calorimetry; value and price invented for the demo' },
    { formula: 'NH4Cl', pricePerKg: 0.5, note: INVENTED_PRICE },
    { formula: 'KNO3', pricePerKg: 1.4, note: INVENTED_PRICE },
    { formula: 'NaNO3', pricePerKg: 0.7, note: INVENTED_PRICE },
    { formula: 'KCl', pricePerKg: 0.4, note: INVENTED_PRICE },
    { formula: 'NaCH3COO·3H2O', pricePerKg: 1.2, note: INVENTED_PRICE },
    { formula: 'Na2S2O3·5H2O', pricePerKg: 0.9, note: INVENTED_PRICE },
    { formula: 'NH4HCO3', pricePerKg: 0.6, note: INVENTED_PRICE },
    { formula: 'KSCN', pricePerKg: 4.0, note: INVENTED_PRICE },
    { formula: 'KH2PO4', pricePerKg: 1.6, note: INVENTED_PRICE },
    { formula: '(NH4)2SO4', pricePerKg: 0.3, note: INVENTED_PRICE },
    { formula: 'Na2SO4·10H2O', pricePerKg: 0.3, note: INVENTED_PRICE },
    { formula: 'xylitol', pricePerKg: 4.5, note: INVENTED_PRICE },
  ],
  options: {
    direction: 'cool',
    fill: '60:60@22',
    spec: 'fill.finalTemperature.high <= 5',
    filters: { excludeSalts: ['NH4NO3'] },
  },
  marks: [
    { at: 5, label: 'target ≤ 5 °C' },
    { at: 22, label: 'start 22 °C' },
  ],
};

/** The hand warmer: 15 g of salt in a 100 g water pouch, from 22 °C, warm but under the burn threshold. */
const handWarmer: DemoPart = {
  name: 'hand-warmer',
  title: 'Hand warmer that stays under the contact-burn threshold',
  brief: `warm to at least 35 °C from 22 °C with 15 g of salt in 100 g of water, the whole 95 % interval below ${CONTACT_BURN_THRESHOLD_C} °C (contact-burn threshold for long contact, after ISO 13732-1, from memory)`,
  candidates: [
    { formula: 'CaCl2', pricePerKg: 0.4, note: INVENTED_PRICE },
    { formula: 'CaCl2·2H2O', pricePerKg: 0.35, note: INVENTED_PRICE },
    { formula: 'MgSO4', pricePerKg: 0.5, note: INVENTED_PRICE },
    { formula: 'MgSO4·H2O', pricePerKg: 0.45, note: INVENTED_PRICE },
    { formula: 'MgCl2', pricePerKg: 0.6, note: INVENTED_PRICE },
    { formula: 'LiCl', pricePerKg: 6.0, note: INVENTED_PRICE },
    { formula: 'LiBr', pricePerKg: 7.5, note: INVENTED_PRICE },
    { formula: 'Li2SO4', pricePerKg: 5.0, note: INVENTED_PRICE },
    { formula: 'Na2CO3', pricePerKg: 0.3, note: INVENTED_PRICE },
    { formula: 'K2CO3', pricePerKg: 1.1, note: INVENTED_PRICE },
    { formula: 'NaCH3COO', pricePerKg: 1.0, note: INVENTED_PRICE },
    { formula: 'Al2(SO4)3', pricePerKg: 0.5, note: INVENTED_PRICE },
    { formula: 'ZnSO4', pricePerKg: 1.3, note: INVENTED_PRICE },
    { formula: 'CuSO4', pricePerKg: 2.2, note: INVENTED_PRICE },
    { formula: 'NaOH', pricePerKg: 0.5, note: INVENTED_PRICE },
  ],
  options: {
    direction: 'heat',
    fill: '15:100@22',
    spec: `fill.finalTemperature.low >= 35 and fill.finalTemperature.high < ${CONTACT_BURN_THRESHOLD_C}`,
  },
  marks: [
    { at: 35, label: 'warm enough ≥ 35 °C' },
    { at: CONTACT_BURN_THRESHOLD_C, label: `burn threshold ${CONTACT_BURN_THRESHOLD_C} °C` },
  ],
};

/** Both parts of the demonstration, in the order they run. */
export const demoParts: readonly DemoPart[] = [coldPack, handWarmer];

/** The candidate list of a part as CSV, as written to docs/examples/. */
export function demoCandidatesCsv(part: DemoPart): string {
  const used = candidateFields.filter((f) => part.candidates.some((c) => c[f] !== undefined));
  return stringify([used, ...part.candidates.map((c) => used.map((f) => c[f] ?? ''))], { escape_formulas: true });
}

const tempText = (r: ScreenRow): string => (r.fill ? estimateText(r.fill.finalTemperature) : '—');

/** The rows best first, then those without a rank in input order. */
const rankOrder = (rows: readonly ScreenRow[]): ScreenRow[] => [...rows].sort((a, b) => (a.rank ?? Infinity) - (b.rank ?? Infinity) || a.line - b.line);

/** Hazard classes, then what a formulator must know about the row: its own measured value, a fill without solubility data. */
function remarks(r: ScreenRow): string {
  const parts: string[] = [...(r.hazards ?? [])];
  if (r.input.measuredEnthalpy !== undefined) parts.push('own measured ΔsolH');
  if (r.fill?.notes.some((n) => n.startsWith('no solubility data'))) parts.push('solubility unknown: the fill is given as if it all dissolved, its interval reaching to none dissolved');
  return parts.join(', ');
}

/** The ranked table of a part: best first, then rows without a rank. */
function rankedTable(result: ScreenResult): string {
  const rows = rankOrder(result.rows);
  const body = rows.map((r) => [
    r.rank !== undefined ? String(r.rank) : '',
    r.status === 'failed' ? r.input.formula : (r.formula ?? r.input.formula),
    r.status === 'computed' ? `${estimateText(r.best)} ${r.best?.basis ?? ''}` : '',
    tempText(r),
    r.fill ? `${r.fill.dissolved[0]!.undissolvedMass.toFixed(1)} g` : '',
    r.costPerKJ ? estimateText(r.costPerKJ) : '',
    r.spec ? (r.spec.holds ? 'meets it' : 'fails') : '',
    r.status === 'failed' ? `cannot be computed: ${r.error?.message ?? ''}` : r.status === 'excluded' ? `ruled out: ${r.excludedBy ?? ''}` : remarks(r),
  ]);
  return textTable(['rank', 'salt', 'ΔsolH kJ/mol [95 %], basis', 'fill reaches °C [95 %]', 'left solid', 'price/kJ [95 %]', 'meets spec?', 'hazards / remarks'], body, new Set([0]));
}

/**
 * The temperature cautions (burns, cold injury, boiling) of the pack model
 * for the candidates that meet the spec, each once, with the salts it
 * concerns; the chemical hazards are in the table's last column.
 */
function temperatureCautions(rows: readonly ScreenRow[]): string[] {
  const TEMPERATURE_KINDS: ReadonlySet<string> = new Set(['contact-burn', 'warm-contact', 'cold-injury', 'boiling']);
  const bySentence = new Map<string, string[]>();
  for (const r of rows) {
    for (const c of r.fill?.cautions ?? []) {
      if (!TEMPERATURE_KINDS.has(c.kind)) continue;
      const key = c.text.split(':')[0]!;
      bySentence.set(key, [...(bySentence.get(key) ?? []), r.formula ?? r.input.formula]);
    }
  }
  return [...bySentence.entries()].map(([head, salts]) => `  Caution — ${head}: ${[...new Set(salts)].join(', ')} (see the fill's cautions in the JSON output).`);
}

/** Runs one part: the screen, its chart, and what to print. */
export function runDemoPart(part: DemoPart, dataset?: Dataset): { result: ScreenResult; svg: string; text: string; markdown: string } {
  const result = screen(part.candidates, part.options, dataset);
  const svg = intervalChart(result, { title: `${part.title} — fill temperature, ranked`, marks: part.marks });
  const passing = [...result.rows].filter((r) => r.spec?.holds).sort((a, b) => (a.costPerKJ?.value ?? Infinity) - (b.costPerKJ?.value ?? Infinity));
  const lines = [
    `${part.title}`,
    `  The supplier asks: ${part.brief}.`,
    `  Fill ${part.options.fill} (salt g : water g @ start °C), spec: ${part.options.spec}`,
    '',
    rankedTable(result),
    passing.length > 0
      ? `  Meet the spec (cheapest heat first, invented prices): ${passing.map((r) => `${r.formula} (${r.costPerKJ ? estimateText(r.costPerKJ) : 'no price'} per kJ)`).join('; ')}.`
      : '  No candidate meets the spec.',
    `  ${result.summary.read} candidates: ${result.summary.computed} computed, ${result.summary.failed} could not be, ${result.summary.excluded} ruled out.`,
    ...temperatureCautions(passing),
  ];
  const markdown = `## ${part.title}\n\nThe supplier asks: ${part.brief}.\n\nStandard fill \`${part.options.fill}\`; spec \`${part.options.spec}\`${part.options.filters ? '; ammonium nitrate left out by a filter' : ''}.\n\n${markdownTableOf(rankOrder(result.rows), result.settings)}\n![${part.title}](${part.name}.svg)\n`;
  return { result, svg, text: lines.join('\n'), markdown };
}

/** `ionheat demo`: the built-in demonstration. */
export const demoCommand: Command = {
  usage: `ionheat demo [--out <dir>] [--json]

  --out <dir>   where to write the candidate lists (CSV), the charts (SVG) and the
                tables (Markdown); default: a new folder under the system's temp folder
  --json        print one JSON object: each part's screen result and the files written

The scenario is described in docs/examples/README.md. Its prices, notes and the one
in-house measurement are invented for the demonstration (source key inventedDemo).`,
  async run(argv, { io, dataset }) {
    const { values } = readArgs(argv, { out: { type: 'string' }, json: { type: 'boolean' } }, { min: 0, max: 0, names: '' });
    const json = values.json === true;
    const say = (text: string) => {
      if (!json) io.stdout(text);
    };
    const results: { name: string; title: string; result: ScreenResult }[] = [];
    let dir: string;
    try {
      if (values.out !== undefined) {
        dir = resolve(io.cwd, values.out);
        mkdirSync(dir, { recursive: true });
      } else dir = mkdtempSync(join(tmpdir(), 'ionheat-demo-'));
    } catch (e) {
      throw new IonheatError('INVALID_ARGUMENT', `cannot make the output folder "${values.out ?? tmpdir()}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`, { field: 'out' });
    }
    say('ionheat demonstration: a first-aid supplier screens salts for two products.\nPrices, notes and the lot-B measurement are invented for the demo; the chemistry is from the built-in tables.\n\n');
    const written: string[] = [];
    const markdown: string[] = ['# Demonstration results', '', 'Written by `ionheat demo --out docs/examples`. Prices, notes and the lot-B measurement are invented for the demonstration (source key `inventedDemo`); enthalpies, solubilities and hazards come from the built-in tables.', ''];
    for (const part of demoParts) {
      const { svg, text, markdown: md, result } = runDemoPart(part, dataset);
      results.push({ name: part.name, title: part.title, result });
      say(`${text}\n\n`);
      const files: [string, string][] = [
        [`${part.name}-candidates.csv`, demoCandidatesCsv(part)],
        [`${part.name}.svg`, svg],
      ];
      for (const [name, content] of files) {
        writeFileSync(join(dir, name), content);
        written.push(join(dir, name));
      }
      markdown.push(md);
    }
    writeFileSync(join(dir, 'results.md'), `${markdown.join('\n')}\n`);
    written.push(join(dir, 'results.md'));
    if (json) {
      io.stdout(`${JSON.stringify({ parts: results, files: written, note: 'prices, notes and the lot-B measurement are invented for the demonstration (source key inventedDemo)' }, null, 2)}\n`);
      return 0;
    }
    say(`Charts and tables written:\n${written.map((f) => `  ${f}`).join('\n')}\n\n`);
    say('These are screening estimates: confirm by measurement, and defer to local codes, product-safety regulation and licensed practice.\n');
    return 0;
  },
};
