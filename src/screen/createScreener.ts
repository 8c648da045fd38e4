/**
 * The engine behind {@link screen} and {@link screenStream}: screens one
 * candidate at a time and keeps the counts of the run. Results for a formula
 * that comes again are reused from a bounded cache, so the memory of a run
 * does not grow with the number of rows.
 *
 * @module
 */
import { mergeOverrides } from '../data/recordCheck.js';
import { describeValue, checkOptionKeys, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset, TableOverrides } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { BoundedCache } from '../data/boundedCache.js';
import type { HazardClass, SourceEntry } from '../data/schemas.js';
import { HAZARD_CLASSES, isTerm } from '../data/tableTerms.js';
import { parseSalt } from '../chem/parseSalt.js';
import { typoSuspicion } from '../chem/typoSuspicion.js';
import { findIon } from '../chem/ionIndex.js';
import { isIssuedSalt } from '../chem/issuedSalts.js';
import { saltRecords } from '../chem/saltRecords.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError, isIonheatError } from '../error.js';
import { dissolve, type DissolveResult } from '../solution/dissolve.js';
import { packFinalTemperature, type PackResult } from '../pack/packFinalTemperature.js';
import { checkFillSpec } from './parseFillSpec.js';
import { ownMeasuredEstimate, withOwnMeasurement } from './ownMeasurement.js';
import { readCandidate, type CandidateInput, type CandidateLike } from './candidate.js';
import { compileSpec, type CompiledSpec } from './compileSpec.js';
import { costPerKJ } from './costPerKJ.js';
import { hazardSummary, type HazardSummary } from './hazardSummary.js';
import { screenObjective, suitabilityOf, unknownSolubility, WARMER_OBJECTIVES } from './screenObjective.js';
import { latentWarmer } from '../warmer/latentWarmer.js';
import { screenSpecSchema } from './screenOutputJsonSchema.js';
import { screenSources } from './screenSources.js';
import { RepeatIndex } from './repeatIndex.js';
import { caution } from '../quantity/caution.js';
import {
  directionSchema,
  objectiveNameSchema,
  type Direction,
  type FillSpec,
  type ObjectiveName,
  type ScreenRow,
  type ScreenSettings,
  type ScreenSummary,
} from './screenRow.js';

/** Candidates a screen leaves out without computing them (each one still gets its row, marked `excluded`). */
export interface ScreenFilters {
  /** Salts to leave out, as formulas; a hydrate goes with its anhydrous salt. */
  excludeSalts?: readonly string[];
  /** Leave out salts containing any of these ions (ion ids, `NH4[+]`). */
  excludeIons?: readonly string[];
  /** Leave out salts the hazards table puts in any of these classes. */
  excludeHazards?: readonly HazardClass[];
  /** Lightest formula unit allowed, g/mol. */
  minMolarMass?: number;
  /** Heaviest formula unit allowed, g/mol. */
  maxMolarMass?: number;
}

/** How to screen. */
export interface ScreenOptions {
  /** What to rank by (default `enthalpy`, or `fill-temperature` when a fill is given). */
  objective?: ObjectiveName;
  /** `cool` (default) or `heat`. */
  direction?: Direction;
  /** A specification every computed row should meet, in the language of {@link compileSpec}. */
  spec?: string;
  /** Candidates to leave out. */
  filters?: ScreenFilters;
  /** Hide each salt's own measured enthalpy of solution and crystal formation enthalpy (see {@link dissolve}). */
  excludeMeasured?: boolean;
  /** Citations for source keys that candidates name in their `source` field. */
  sources?: Readonly<Record<string, SourceEntry>>;
  /**
   * A standard fill to put every candidate through the pack model
   * ({@link packFinalTemperature}): grams of salt, grams of water and the
   * start temperature, as an object or as text `40:80@22`.
   */
  fill?: FillSpec | string;
}

/** A screen in progress: one row per candidate, and the counts so far. */
export interface Screener {
  readonly settings: ScreenSettings;
  /** Screens one candidate; `line` defaults to the next line number. */
  row(candidate: CandidateLike, line?: number): ScreenRow;
  /** The row of an input record that could not even be read as a candidate. */
  unreadable(line: number, input: { formula?: string }, error: unknown): ScreenRow;
  /** Counts one blank input line (not a row). */
  blankLine(): void;
  summary(): ScreenSummary;
}

/** Results kept per distinct candidate: at most this many. */
const CACHE_LIMIT = 4096;
/** Datasets with a row's own values merged in, kept per distinct set of values. */
const DATASET_CACHE_LIMIT = 32;
/** Distinct candidates remembered for spotting repeated rows. */
const DUPLICATE_LIMIT = 1_000_000;

/** The standard warmer of a screen ranked by a warmer objective: 100 g of hydrate triggered at 20 °C, against the assumed heat loss. */
const STANDARD_WARMER = { massG: 100, startC: 20 } as const;

/** What a row keeps of the standard warmer, or why there is none. */
type WarmerOutcome = { ok: true; row: NonNullable<ScreenRow['warmer']> } | { ok: false; why: string };

function standardWarmer(salt: Salt, dataset: Dataset): WarmerOutcome {
  try {
    const w = latentWarmer({ salt, ...STANDARD_WARMER }, {}, dataset);
    const { plateau, crystallisedAtPlateau, heatReleased, heatPerGram, plateauDuration, rechargeTemperature, cautions, notes } = w;
    return { ok: true, row: { plateau, crystallisedAtPlateau, heatReleased, heatPerGram, plateauDuration, rechargeTemperature, cautions, notes } };
  } catch (e) {
    if (!isIonheatError(e)) throw e;
    return { ok: false, why: e.message };
  }
}

type Computed =
  | { ok: true; salt: Salt; result: DissolveResult; pack: PackResult | undefined; warmer: WarmerOutcome | undefined; hazards: HazardSummary }
  | { ok: false; salt?: Salt; error: IonheatError };

const SCREEN_OPTIONS = optionNames<ScreenOptions>('the screen', { objective: true, direction: true, spec: true, filters: true, excludeMeasured: true, sources: true, fill: true });
const FILTER_KEYS = optionNames<ScreenFilters>('the screen filters', { excludeSalts: true, excludeIons: true, excludeHazards: true, minMolarMass: true, maxMolarMass: true });
/** The message of anything thrown, without trusting it (it may itself be a hostile object). */
function thrownText(e: unknown): string {
  try {
    return e instanceof Error ? e.message : String(e);
  } catch {
    return 'an object that cannot even be shown';
  }
}

/**
 * The options read once into a plain object of our own: a getter that
 * throws, or a revoked proxy, becomes one `INVALID_ARGUMENT` error here
 * rather than a raw error from deep inside the screen.
 */
function ownOptions(options: ScreenOptions): ScreenOptions {
  try {
    const { objective, direction, spec, filters, excludeMeasured, sources, fill } = options;
    return {
      ...(objective !== undefined ? { objective } : {}),
      ...(direction !== undefined ? { direction } : {}),
      ...(spec !== undefined ? { spec } : {}),
      ...(filters !== undefined ? { filters: filters !== null && typeof filters === 'object' ? { ...filters } : filters } : {}),
      ...(excludeMeasured !== undefined ? { excludeMeasured } : {}),
      ...(sources !== undefined && sources !== null ? { sources: { ...sources } } : {}),
      ...(fill !== undefined ? { fill: fill !== null && typeof fill === 'object' ? { ...fill } : fill } : {}),
    };
  } catch (e) {
    throw new IonheatError('INVALID_ARGUMENT', `the options of the screen could not be read: ${thrownText(e)}`, { field: 'options' });
  }
}

/** What the caller's own list of candidates (its iterator) threw, as an IonheatError naming the list. */
export function candidateListError(e: unknown): IonheatError {
  return isIonheatError(e) ? e : new IonheatError('INVALID_ARGUMENT', `the list of candidates could not be read: ${thrownText(e)}`, { field: 'candidates' });
}

/** The candidate's fields as one text, in a fixed order. */
function candidateKey(input: CandidateInput): string {
  // Numbers through JSON.stringify: the same digits as String(), without V8's number-to-string cache,
  // which would keep a string per row alive for a while on long screens.
  const n = (x: number | undefined) => (x === undefined ? '' : JSON.stringify(x));
  return `${input.formula}\u0000${n(input.measuredEnthalpy)}\u0000${n(input.measuredUncertainty)}\u0000${n(input.solubility)}\u0000${n(input.pricePerKg)}\u0000${input.source ?? ''}\u0000${input.note ?? ''}`;
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

function checkFilters(filters: ScreenFilters, dataset: Dataset): { salts: Set<string>; ions: Set<string>; hazards: Set<HazardClass> } {
  if (filters === null || typeof filters !== 'object') throw new IonheatError('INVALID_ARGUMENT', `filters must be an object, got ${describeValue(filters)}`, { field: 'filters' });
  checkOptionKeys(filters, FILTER_KEYS, 'filters');
  for (const k of ['excludeSalts', 'excludeIons', 'excludeHazards'] as const) {
    const v: unknown = filters[k];
    if (v !== undefined && !(Array.isArray(v) && v.every((x) => typeof x === 'string'))) throw new IonheatError('INVALID_ARGUMENT', `${k} must be a list of text when given, got ${describeValue(v)}`, { field: k });
  }
  const salts = new Set((filters.excludeSalts ?? []).map((f) => parseSalt(f, dataset).anhydrous));
  for (const id of filters.excludeIons ?? []) {
    if (!findIon(id, dataset)) throw new IonheatError('UNKNOWN_ION', `excludeIons: "${id}" is not an ion id of the ${dataset.label} ion table (ids look like NH4[+], NO3[-])`, { field: 'excludeIons', text: id });
  }
  for (const h of filters.excludeHazards ?? []) {
    if (!isTerm(HAZARD_CLASSES, h)) throw new IonheatError('INVALID_ARGUMENT', `excludeHazards: ${describeValue(h)} is not a hazard class (known: ${HAZARD_CLASSES.join(', ')})`, { field: 'excludeHazards' });
  }
  for (const [name, v] of [['minMolarMass', filters.minMolarMass], ['maxMolarMass', filters.maxMolarMass]] as const) {
    if (v !== undefined && !(Number.isFinite(v) && v > 0)) throw new IonheatError('INVALID_ARGUMENT', `${name} is a molar mass in g/mol and must be a positive number, got ${describeValue(v)}`, { field: name });
  }
  return { salts, ions: new Set(filters.excludeIons ?? []), hazards: new Set(filters.excludeHazards ?? []) };
}

/**
 * Starts a screen: checks the options (objective, direction, filters, the
 * specification against the fields of the output rows) and returns a
 * {@link Screener} that turns candidates into rows one at a time.
 *
 * @param options - objective, direction (`cool` or `heat`), spec, filters, `excludeMeasured`, extra sources, and a
 *   standard fill (g salt, g water, start °C; as an object or as text `40:80@22`)
 * @param dataset - the tables every row is computed from (default: built-in)
 * @see the bases and their sources as in {@link dissolve} (`crcSolution`, `parker1965`, `wagman1982`, `marcus1997`,
 *   `jenkinsGlasser2004`); hazards from the hazards table (`clpAnnexVI`, `eu2019_1148`, …); docs/methods.md, "Screening".
 * @throws IonheatError `INVALID_ARGUMENT` for a bad option, `INVALID_EXPRESSION` for a bad spec
 * @example
 * ```ts
 * const s = createScreener({ spec: 'best.low > 0' });
 * s.row('KNO3').spec?.holds; // true
 * s.row('Xy2O').status; // 'failed'
 * s.summary().failed; // 1
 * // a hot pack: 30 g CaCl2 in 100 g water from 20 °C
 * const hot = createScreener({ direction: 'heat', fill: '30:100@20' }).row('CaCl2');
 * hot.suitability; // 'suitable'
 * hot.fill.finalTemperature.value; // ≈ 72.0 °C
 * ```
 */
export function createScreener(options: ScreenOptions = {}, dataset: Dataset = builtinDataset()): Screener {
  if (options === null || typeof options !== 'object') throw new IonheatError('INVALID_ARGUMENT', 'the options of a screen are an object', { field: 'options' });
  const given = options;
  options = ownOptions(options); // the known keys, read once (a throwing getter or a revoked proxy is INVALID_ARGUMENT)
  try {
    checkOptionKeys(given, SCREEN_OPTIONS, 'options'); // on what was given: the copy holds only known keys
  } catch (e) {
    if (isIonheatError(e)) throw e;
    throw new IonheatError('INVALID_ARGUMENT', `the options of the screen could not be read: ${thrownText(e)}`, { field: 'options' });
  }
  const fill: FillSpec | null = options.fill === undefined ? null : checkFillSpec(options.fill);
  const objectiveParsed = objectiveNameSchema.safeParse(options.objective ?? (fill ? 'fill-temperature' : 'enthalpy'));
  if (!objectiveParsed.success) throw new IonheatError('INVALID_ARGUMENT', `objective: ${describeValue(options.objective)} is not one of ${objectiveNameSchema.options.join(', ')}`, { field: 'objective' });
  const directionParsed = directionSchema.safeParse(options.direction ?? 'cool');
  if (!directionParsed.success) throw new IonheatError('INVALID_ARGUMENT', `direction: ${describeValue(options.direction)} is not cool or heat`, { field: 'direction' });
  const objective = objectiveParsed.data;
  const direction = directionParsed.data;
  const wantsWarmer = WARMER_OBJECTIVES.has(objective);
  if (objective === 'fill-temperature' && fill === null) throw new IonheatError('INVALID_ARGUMENT', 'the objective fill-temperature needs a standard fill (salt grams, water grams and start temperature)', { field: 'objective' });
  const excludeMeasured = options.excludeMeasured === true;
  const filters = checkFilters(options.filters ?? {}, dataset);
  const minMass = options.filters?.minMolarMass;
  const maxMass = options.filters?.maxMolarMass;
  const sources: Record<string, SourceEntry> = { ...screenSources, ...(options.sources ?? {}) };
  const spec: CompiledSpec | undefined =
    options.spec === undefined
      ? undefined
      : compileSpec(options.spec, {
          schema: screenSpecSchema(),
          unavailable: { ...(fill === null ? { fill: 'no standard fill was given' } : {}), ...(wantsWarmer ? {} : { warmer: 'the standard warmer is computed only when ranking by a warmer objective' }) },
        });
  const settings: ScreenSettings = { objective, direction, fill, spec: spec?.text ?? null, excludeMeasured };

  const results = new BoundedCache<string, Computed>(CACHE_LIMIT);
  const datasets = new BoundedCache<string, Dataset>(DATASET_CACHE_LIMIT);
  const seen = new RepeatIndex(DUPLICATE_LIMIT);
  const tally: ScreenSummary = { read: 0, computed: 0, failed: 0, excluded: 0, blankLines: 0, specHeld: 0, specFailed: 0 };
  let nextLine = 1;

  /**
   * The dataset with the row's own values merged over the tables through
   * {@link Dataset.withOverrides}: a measured enthalpy of solution, and a
   * solubility taken as the same at every temperature. The tables themselves
   * never change; each distinct set of values gets its own merged dataset.
   */
  const rowDataset = (input: CandidateInput, salt: Salt): Dataset => {
    const { source } = sourceOf(input);
    const key = JSON.stringify([salt.formula, input.measuredEnthalpy, input.measuredUncertainty, input.solubility, source]);
    const cached = datasets.get(key);
    if (cached) return cached;
    const overrides: TableOverrides = {};
    if (input.measuredEnthalpy !== undefined) {
      // Replace the table's own record for this salt: use its key, as written in the table.
      const existing = saltRecords('solution-enthalpies.json', salt, dataset)[0];
      overrides['solution-enthalpies.json'] = [
        { formula: existing?.formula ?? salt.formula, value: input.measuredEnthalpy, unit: 'kJ/mol', uncertainty: input.measuredUncertainty ?? null, source, fromMemory: false, note: 'given with the candidate in the screening input' },
      ];
    }
    if (input.solubility !== undefined) {
      const existing = saltRecords('solubility.json', { formula: salt.anhydrous }, dataset)[0];
      overrides['solubility.json'] = [
        {
          formula: existing?.formula ?? salt.anhydrous,
          ...(salt.water > 0 ? { solidPhase: salt.formula } : {}),
          unit: 'g/100 g H2O',
          points: [
            { t: 0, value: input.solubility },
            { t: 100, value: input.solubility },
          ],
          source,
          fromMemory: false,
          note: 'given with the candidate in the screening input, taken as the same at every temperature',
        },
      ];
    }
    const merged = mergeOverrides(dataset, overrides, 'screening input', dataset.source(source) ? {} : { [source]: sources[source]! });
    datasets.set(key, merged);
    return merged;
  };

  /** The source of a row's own values, checked: a key of the dataset's sources or of the screen's. */
  const sourceOf = (input: CandidateInput): { source: string; citation?: SourceEntry } => {
    const source = input.source ?? 'screenInput';
    if (dataset.source(source)) return { source };
    if (Object.hasOwn(sources, source)) return { source, citation: sources[source]! };
    throw new IonheatError('INVALID_ARGUMENT', `source: "${source}" is neither a source of the ${dataset.label} tables nor one given with the screen (${Object.keys(sources).join(', ')})`, { field: 'source', text: source });
  };

  /**
   * dissolve with the row's own measured enthalpy: the cheap path of
   * ownMeasurement.ts where the tables alone can already estimate the salt,
   * else (a salt the tables cannot speak for) a merged dataset.
   */
  const dissolveOwn = (input: CandidateInput, salt: Salt): DissolveResult => {
    const { source, citation } = sourceOf(input);
    const existing = saltRecords('solution-enthalpies.json', salt, dataset)[0];
    const measured = ownMeasuredEstimate(salt, existing?.formula ?? salt.formula, { value: input.measuredEnthalpy!, u: input.measuredUncertainty, source, ...(citation ? { citation } : {}) }, dataset);
    let base: DissolveResult | undefined;
    try {
      base = dissolve(salt, { excludeMeasured }, dataset);
    } catch (e) {
      if (!isIonheatError(e) || excludeMeasured) throw e;
    }
    if (excludeMeasured) return base!;
    return base ? withOwnMeasurement(base, measured, dataset) : dissolve(salt, {}, rowDataset(input, salt));
  };

  const compute = (input: CandidateInput, given: Salt | undefined): Computed => {
    const own = input.measuredEnthalpy !== undefined || input.solubility !== undefined;
    const key = given ? `salt\u0000${input.formula}` : own ? JSON.stringify([input.formula, input.measuredEnthalpy, input.measuredUncertainty, input.solubility, input.source]) : input.formula;
    const cached = results.get(key);
    if (cached) return cached;
    let computed: Computed;
    // A salt parseSalt issued is frozen and trusted; any other object claiming to be a salt (a copy, a proxy) is read again from its formula.
    let salt: Salt | undefined = given && isIssuedSalt(given) ? given : undefined;
    try {
      salt ??= parseSalt(input.formula, dataset);
      // A fill, or a solubility, needs the row's values in a merged dataset (the pack model reads the tables);
      // a measured value alone takes the cheap path.
      const merged = own && (fill !== null || input.solubility !== undefined) ? rowDataset(input, salt) : undefined;
      if (input.source !== undefined || own) sourceOf(input);
      const result = merged ? dissolve(salt, { excludeMeasured }, merged) : input.measuredEnthalpy !== undefined ? dissolveOwn(input, salt) : dissolve(salt, { excludeMeasured }, dataset);
      const pack = fill ? packFinalTemperature({ solids: [{ formula: salt.formula, massG: fill.saltMassG }], waterG: fill.waterMassG, startC: fill.startC }, {}, merged ?? dataset) : undefined;
      const warmer = wantsWarmer ? standardWarmer(salt, dataset) : undefined;
      computed = deepFreeze({ ok: true, salt, result, pack, warmer, hazards: hazardSummary(salt, dataset) });
    } catch (e) {
      if (!isIonheatError(e)) throw e;
      computed = { ok: false, ...(salt ? { salt } : {}), error: e };
    }
    results.set(key, computed);
    return computed;
  };

  const exclusion = (salt: Salt, hazards: () => HazardSummary): string | undefined => {
    if (filters.salts.has(salt.anhydrous)) return `${salt.anhydrous} is on the list of salts to leave out`;
    const ion = salt.ions.find((i) => filters.ions.has(i.ion));
    if (ion) return `contains ${ion.ion}, an ion to leave out`;
    if (minMass !== undefined && salt.molarMass < minMass) return `molar mass ${salt.molarMass.toFixed(2)} g/mol is below ${minMass} g/mol`;
    if (maxMass !== undefined && salt.molarMass > maxMass) return `molar mass ${salt.molarMass.toFixed(2)} g/mol is above ${maxMass} g/mol`;
    if (filters.hazards.size > 0) {
      const hit = hazards().classes.filter((c) => filters.hazards.has(c));
      if (hit.length > 0) return `hazard class ${hit.join(', ')} is to be left out`;
    }
    return undefined;
  };

  const finish = (row: ScreenRow): ScreenRow => {
    tally.read++;
    if (row.status === 'computed') {
      tally.computed++;
      if (spec) {
        const outcome = spec.test(row);
        row.spec = outcome;
        if (outcome.holds) tally.specHeld++;
        else tally.specFailed++;
      }
    } else if (row.status === 'failed') tally.failed++;
    else tally.excluded++;
    return row;
  };

  const failedRow = (line: number, input: CandidateInput | { formula?: string }, error: IonheatError, salt?: Salt): ScreenRow => {
    const formula = typeof input.formula === 'string' ? input.formula.slice(0, 200) : '';
    return finish({ line, status: 'failed', input: { ...input, formula } as CandidateInput, error: error.toJSON(), ...(salt ? { formula: salt.formula } : {}) });
  };

  return {
    settings,
    row(candidate, line) {
      const at = line ?? nextLine;
      nextLine = at + 1;
      let read: { input: CandidateInput; salt?: Salt };
      try {
        read = readCandidate(candidate);
      } catch (e) {
        // A candidate is the caller's object: a getter that throws, or a revoked proxy, is one failed row, not the end of the screen.
        const error = isIonheatError(e) ? e : new IonheatError('INVALID_ARGUMENT', `the candidate could not be read: ${thrownText(e)}`, { field: 'candidate' });
        let formula = '';
        try {
          formula = typeof candidate === 'string' ? candidate : candidate && typeof candidate === 'object' && typeof (candidate as { formula?: unknown }).formula === 'string' ? (candidate as { formula: string }).formula : '';
        } catch {
          // the formula cannot be read either
        }
        return failedRow(at, { formula }, error);
      }
      const { input } = read;
      const first = seen.firstLine(read.salt ? `salt\u0000${input.formula}` : candidateKey(input), at);
      const duplicate = first !== undefined ? { duplicateOf: first } : {};

      const computed = compute(input, read.salt);
      if (!computed.ok) {
        const row = failedRow(at, input, computed.error, computed.salt);
        return Object.assign(row, duplicate);
      }
      const { salt, result, hazards, pack, warmer } = computed;
      const excludedBy = exclusion(salt, () => hazards);
      if (excludedBy !== undefined) {
        return finish({ line: at, status: 'excluded', input, ...duplicate, formula: salt.formula, salt, excludedBy, hazards: hazards.classes, cautions: result.cautions, hazardData: hazards.data });
      }
      const notes: string[] = [];
      if (input.measuredEnthalpy !== undefined) notes.push(`measured enthalpy of solution from the screening input (source ${input.source ?? 'screenInput'})${excludeMeasured ? ', hidden by excludeMeasured' : ''}`);
      if (input.solubility !== undefined) notes.push(`solubility ${input.solubility} g/100 g H2O from the screening input (source ${input.source ?? 'screenInput'}), taken as the same at every temperature${fill ? '' : '; it matters only to a fill'}`);
      if (pack && excludeMeasured) notes.push('the standard fill uses the enthalpy of solution the pack model finds, measured values included: excludeMeasured hides them from dissolve only');
      if (first !== undefined) notes.push(`the same candidate as line ${first}`);
      // A formula that reads through a likely slip is computed (both readings are real salts) but never ranked silently.
      const typo = read.salt ? undefined : typoSuspicion(input.formula, salt, dataset);
      const cost = input.pricePerKg === undefined ? undefined : costPerKJ(input.pricePerKg, result.perGram.salt, direction);
      if (input.pricePerKg !== undefined && cost === undefined) notes.push(`no cost per kJ: the 95 % interval of the heat per gram reaches zero or the wrong sign for ${direction === 'cool' ? 'cooling' : 'heating'}`);
      if (warmer && !warmer.ok) notes.push(`no standard warmer (100 g triggered at 20 °C): ${warmer.why}`);
      const warmerRow = warmer?.ok ? warmer.row : undefined;
      const base = { ...result, ...(cost ? { costPerKJ: cost } : {}), ...(pack ? { fill: pack } : {}), ...(warmerRow ? { warmer: warmerRow } : {}) };
      const objectiveValue = screenObjective(objective, base);
      if (objective === 'cost-per-kj' && input.pricePerKg === undefined) notes.push('no price per kg given, so no cost per kJ to rank by');
      const unknown = pack ? unknownSolubility(pack) : undefined;
      if (objective === 'fill-temperature' && unknown !== undefined) notes.push(`not ranked by the fill: the solubility of ${pack!.dissolved[unknown]!.formula} is unknown, so the fill may reach anything from its start to its full-dissolution temperature; give a solubility (g per 100 g water) with the candidate to rank it`);
      const row: ScreenRow = {
        line: at,
        status: 'computed',
        input,
        ...duplicate,
        ...result,
        notes: notes.length > 0 ? [...result.notes, ...notes] : result.notes,
        hazards: hazards.classes,
        cautions: typo ? [caution('suspected-typo', 'warning', `Suspected typo: ${typo.message}. The values given are those of ${salt.formula} as read; the row is ranked as undetermined.`), ...result.cautions] : result.cautions,
        hazardData: hazards.data,
        ...(pack ? { fill: pack as unknown as NonNullable<ScreenRow['fill']> } : {}),
        ...(warmerRow ? { warmer: warmerRow } : {}),
        suitability: typo ? 'undetermined' : suitabilityOf(result.verdict, direction),
        ...(typo ? { suspectedTypo: { suggestion: typo.suggestion, message: typo.message } } : {}),
        ...(objectiveValue ? { objective: objectiveValue } : {}),
        ...(cost ? { costPerKJ: cost } : {}),
      };
      return finish(row);
    },
    unreadable(line, input, error) {
      nextLine = line + 1;
      const e = isIonheatError(error) ? error : new IonheatError('INVALID_ARGUMENT', error instanceof Error ? error.message : String(error));
      return failedRow(line, input, e);
    },
    blankLine() {
      tally.blankLines++;
    },
    summary() {
      return { ...tally };
    },
  };
}
