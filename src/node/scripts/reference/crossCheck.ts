/**
 * Every comparison of a data record with an open reference copy under
 * `tests/reference/`: one place that says which record meets which reference
 * value, at which tolerance and why. Read by the cross-check test
 * (tests/data/reference-crosscheck.test.ts), by `npm run provenance` and by
 * `markChecked.ts`, which writes `checkedAgainst` onto the records that pass.
 *
 * A record whose value lies outside the tolerance passes only when its note
 * says `differs from <reference>` (the file name without `.json`) and why; the
 * tolerance is never widened to make a record pass.
 *
 * @module
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { readFormulaSyntax, unitComposition } from '../../../chem/formulaSyntax.js';
import { parseSalt } from '../../../chem/parseSalt.js';

/** A reference copy: the package it came from, and its numbers. */
export interface ReferenceFile {
  package: string;
  version: string;
  licence: string;
  file: string;
  records: any[];
}

/** One record compared with one reference value. */
export interface Check {
  /** Family name (see FAMILIES). */
  family: string;
  /** Data file under data/. */
  table: string;
  /** Position of the record in its table. */
  index: number;
  /** What the record is about (formula, ion id, element …). */
  subject: string;
  ours: number;
  ref: number;
  tolerance: number;
  /** Reference file name without `.json`. */
  reference: string;
  /** How the reference names the matching entry (CAS and label, formula …). */
  refLabel: string;
  agree: boolean;
  /** The record's note says why it differs from this reference. */
  explained: boolean;
  /** Where the compared number is a nested quantity of the record (warmer-melts.json), its field; the provenance (`fromMemory`, `checkedAgainst`, `note`) is that quantity's own. */
  field?: string;
}

/** The object that carries a check's provenance: the record, or its nested quantity. */
export function checkedObject(tables: Record<string, any>, check: Check): any {
  const record = tables[check.table].records[check.index];
  return check.field ? record[check.field] : record;
}

/** A family of comparisons: one quantity of one table against one reference, with its tolerance and why. */
export interface Family {
  name: string;
  table: string;
  reference: string;
  why: string;
}

/** The `checkedAgainst` text a record of this family carries: the copy (or copies) its value was matched with. */
export function checkedAgainstText(family: Family): string {
  const files = [family.reference, ...(COMBINED_WITH[family.name] ?? [])].map((r) => `tests/reference/${r}.json`);
  const what = QUANTITY[family.name];
  return `${files.join(' + ')}${what ? ` (${what})` : ''}`;
}

/** Families whose reference value combines a second copy. */
const COMBINED_WITH: Record<string, string[]> = {
  gasIonCycle: ['chemicals-crc-thermo'],
  solutionClosureCrc: ['chemicals-crc-aqueous-ions'],
  hydrationCycle: ['chemicals-janaf-gas'],
  hydrationMarcusCycle: ['chemicals-janaf-gas'],
};
/** What was compared, where a record holds more than the compared number. */
const QUANTITY: Record<string, string> = {
  densityCrc: 'density',
  warmerSolidCpPerry: 'solid heat capacity per gram',
  densityCrcOrganic: 'density',
  gasIonCycle: 'cycle: atom + ionization energies',
  solutionClosureCrc: 'closure: ions minus crystal',
  bondAtct: '2·atom − molecule',
  ionCompositionCrc: 'composition and charge',
  ionCompositionShannon: 'composition and charge',
  moleculeCompositionCrc: 'composition',
  hydrationCycle: 'cycle: aqueous ion, proton, gaseous ion',
  hydrationMarcusCycle: "cycle on Marcus's proton scale; Marcus's own table not reachable",
  solubilityProductLlnl: 'log K as written in llnl.dat',
};

/** 5/2 RT at 298.15 K, kJ/mol: the enthalpy of the thermal electron (electron convention minus ion convention, per unit of charge). */
const FIVE_HALVES_RT = (2.5 * 8.314462618 * 298.15) / 1000;

/**
 * Tolerances, each with its reason. An absolute tolerance covers the rounding
 * of the printed values plus the known scatter between the two compilations.
 */
export const FAMILIES: Record<string, Family> = {
  formationCrc: {
    name: 'formationCrc',
    table: 'compound-formation.json',
    reference: 'chemicals-crc-thermo',
    why: 'ΔfH°(cr, l): the CRC table reproduces NBS/CODATA values rounded to 0.1 kJ/mol; 0.5 kJ/mol or 0.05 % (whichever is larger) covers that rounding and the last-digit revisions between CRC editions, far below the 1 kJ/mol default uncertainty of the table.',
  },
  solubilityProductLlnl: {
    name: 'solubilityProductLlnl',
    table: 'solubility-products.json',
    reference: 'phreeqc-llnl-phases',
    why: 'log K of the dissolution reaction as llnl.dat writes it, matched by phase name: both are read from the same file by two separate scripts, printed to 4 decimals, so 0.0001 covers the rounding; this checks the transcription, not the thermodynamics.',
  },
  formationLlnl: {
    name: 'formationLlnl',
    table: 'compound-formation.json',
    reference: 'phreeqc-llnl-phases',
    why: 'ΔfH°(cr) of solids the CRC copy lacks (mostly hydrates): llnl.dat quotes NBS-based values, often in kcal/mol to 0.01 kcal (0.04 kJ); 1 kJ/mol or 0.1 % covers kcal rounding and its occasional newer source.',
  },
  heatCapacityJanaf: {
    name: 'heatCapacityJanaf',
    table: 'heat-capacities.json',
    reference: 'chemicals-janaf-solid-cp',
    why: 'Cp°(298.15 K) of solids the CRC copy lacks: JANAF tabulates 0.001 J/(mol·K); 0.5 J/(mol·K) or 1 % covers NBS vs JANAF evaluations of the same calorimetry.',
  },
  heatCapacityPerry: {
    name: 'heatCapacityPerry',
    table: 'heat-capacities.json',
    reference: 'chemicals-perry-cp',
    why: 'Cp°(298.15 K) of solids neither CRC nor JANAF copy has (hydrates): Perry\'s equation in cal/(mol·K) at 298.15 K; tolerance the error the table states for the equation, or 3 % where it states none (these old constants are mostly given to three digits).',
  },
  heatCapacityCrc: {
    name: 'heatCapacityCrc',
    table: 'heat-capacities.json',
    reference: 'chemicals-crc-thermo',
    why: 'Cp°(298 K): CRC prints 0.1 J/(mol·K) from the same NBS/CODATA sources; 0.5 J/(mol·K) or 1 % covers rounding and NBS vs CODATA revisions, below the 2 % the pack balance can notice.',
  },
  warmerSolidCpPerry: {
    name: 'warmerSolidCpPerry',
    table: 'warmer-melts.json',
    reference: 'chemicals-perry-cp',
    why: "specific heat capacity of a warmer's solid hydrate, J/(g·K), against Perry's constant for that hydrate (cal/(mol·K) × 4.184 at 298.15 K, divided by the molar mass): Perry gives these hydrate constants to three or four digits with no stated error, so 3 % as in heatCapacityPerry; the record's own standard uncertainty (about 10 %) is far wider.",
  },
  densityCrc: {
    name: 'densityCrc',
    table: 'crystals.json',
    reference: 'chemicals-crc-densities',
    why: 'density: the CRC physical-constants table prints 2–4 significant digits; 0.015 g/cm³ or 0.6 %, or half a unit of the last digit the reference prints (2.7 means 2.65–2.75), covers that rounding, while a different polymorph or hydrate differs by more.',
  },
  densityCrcOrganic: {
    name: 'densityCrcOrganic',
    table: 'crystals.json',
    reference: 'chemicals-crc-organic-densities',
    why: 'density of the organic solutes (urea, sugars, sugar alcohols), from the CRC organic physical-constants table, which prints 4–5 significant digits: 0.015 g/cm³ or 0.6 % covers the 2–3 digits of our records; isomers of one formula are told apart by the label (REQUIRED_LABEL).',
  },
  aqueousIonCrc: {
    name: 'aqueousIonCrc',
    table: 'ion-formation-aq.json',
    reference: 'chemicals-crc-aqueous-ions',
    why: 'ΔfH°(aq): the CRC aqueous-ion table is the NBS set rounded to 0.1 kJ/mol; 0.3 kJ/mol covers the rounding of both copies.',
  },
  aqueousIonCpCrc: {
    name: 'aqueousIonCpCrc',
    table: 'ion-heat-capacities-aq.json',
    reference: 'chemicals-crc-aqueous-ions',
    why: 'Cp°(aq): the CRC table is the NBS set at 0.1 J/(mol·K); 0.5 J/(mol·K) covers rounding.',
  },
  gasIonJanaf: {
    name: 'gasIonJanaf',
    table: 'ion-formation-gas.json',
    reference: 'chemicals-janaf-gas',
    why: 'ΔfH°(ion, g), electron convention in both: JANAF and NBS share most of their inputs; 1 kJ/mol covers their independent evaluations of the same spectroscopic data.',
  },
  gasIonCycle: {
    name: 'gasIonCycle',
    table: 'ion-formation-gas.json',
    reference: 'pymatgen-atomic',
    why: 'ΔfH°(M^z+, g) = ΔfH°(M, g) (CRC copy) + ΣIE (pymatgen copy) + z·5/2 RT, where no copy tabulates the ion: 2 kJ/mol covers the thermal enthalpies of atom and ion (which the cycle sets equal) and the differences between NBS and CODATA atoms.',
  },
  gasIonAtct: {
    name: 'gasIonAtct',
    table: 'ion-formation-gas.json',
    reference: 'chemicals-atct-gas',
    why: 'ΔfH°(ion, g), ATcT converted to the electron convention (+ z·5/2 RT): NBS and ATcT agree within about 1.5 kJ/mol for well-known ions; tolerance 1.5 kJ/mol plus twice the ATcT uncertainty. A larger gap means an outdated input (an old acidity or electron affinity), which is fixed, or a basis difference named on the record.',
  },
  atomizationCrc: {
    name: 'atomizationCrc',
    table: 'atomization-enthalpies.json',
    reference: 'chemicals-crc-thermo',
    why: 'ΔfH°(atom, g): the CRC table reproduces the CODATA/NBS atoms at 0.1 kJ/mol; 0.5 kJ/mol covers rounding.',
  },
  atomizationAtct: {
    name: 'atomizationAtct',
    table: 'atomization-enthalpies.json',
    reference: 'chemicals-atct-gas',
    why: 'ΔfH°(atom, g): CODATA/NBS vs ATcT; 1 kJ/mol plus twice the ATcT uncertainty covers the revisions of the last decades for well-measured atoms.',
  },
  bondAtct: {
    name: 'bondAtct',
    table: 'bond-dissociation.json',
    reference: 'chemicals-atct-gas',
    why: 'D°298(X2) = 2ΔfH°(X, g) − ΔfH°(X2, g) from ATcT; 1 kJ/mol plus twice the combined ATcT uncertainty.',
  },
  ionizationPymatgen: {
    name: 'ionizationPymatgen',
    table: 'ionization-energies.json',
    reference: 'pymatgen-atomic',
    why: 'ionization energies: both from NIST ASD eV values; 0.1 % or 0.2 kJ/mol covers the eV → kJ/mol conversion and last-digit updates of ASD.',
  },
  affinityPymatgen: {
    name: 'affinityPymatgen',
    table: 'electron-affinities.json',
    reference: 'pymatgen-atomic',
    why: 'electron affinities: both from photodetachment eV values; 0.3 kJ/mol (0.003 eV) covers conversion and rounding.',
  },
  shannonPymatgen: {
    name: 'shannonPymatgen',
    table: 'shannon-radii.json',
    reference: 'pymatgen-shannon-radii',
    why: 'Shannon effective ionic radii are printed to 0.01 Å (a few to 0.001 Å); 0.005 Å allows the last-digit rounding only.',
  },
  massPymatgen: {
    name: 'massPymatgen',
    table: 'elements.json',
    reference: 'pymatgen-atomic',
    why: 'standard atomic weights: the package carries the IUPAC values of its time; 0.01 g/mol or the record uncertainty (whichever is larger), or anywhere inside the IUPAC interval given in the record note, covers the conventional values chosen for interval elements.',
  },
  solutionClosureCrc: {
    name: 'solutionClosureCrc',
    table: 'solution-enthalpies.json',
    reference: 'chemicals-crc-thermo',
    why: 'ΔsolH° = Σν·ΔfH°(ion, aq) − ΔfH°(cr) (+ n·ΔfH°(H2O, l) for a hydrate), every term from the two CRC copies: three or four numbers each rounded to 0.1 kJ/mol (at most 0.2 kJ/mol together) and our own value rounded to 0.01; 0.5 kJ/mol leaves room for that and for the last-digit revisions between CRC editions.',
  },
  solutionLlnl: {
    name: 'solutionLlnl',
    table: 'solution-enthalpies.json',
    reference: 'phreeqc-llnl-phases',
    why: 'ΔsolH° where the CRC copies cannot close the cycle (hydrates): llnl.dat\'s enthalpy of the plain dissolution reaction, NBS-based and quoted to 0.01 kcal; 1 kJ/mol covers its kcal rounding and its occasional other ion basis.',
  },
  ionCompositionCrc: {
    name: 'ionCompositionCrc',
    table: 'ions.json',
    reference: 'chemicals-crc-aqueous-ions',
    why: 'an ion\'s composition and charge exist as an aqueous ion of the CRC table: the elemental formula and the charge must match exactly.',
  },
  moleculeCompositionCrc: {
    name: 'moleculeCompositionCrc',
    table: 'ions.json',
    reference: 'chemicals-crc-thermo',
    why: 'a non-electrolyte solute\'s composition is that of the crystalline substance of the CRC table with the name it is filed under (urea, not ammonium cyanate): the elemental formula must match exactly.',
  },
  ionCompositionShannon: {
    name: 'ionCompositionShannon',
    table: 'ions.json',
    reference: 'pymatgen-shannon-radii',
    why: 'as ionCompositionCrc, for monatomic ions neither table has: Shannon lists the element in that oxidation state.',
  },
  hydrationCycle: {
    name: 'hydrationCycle',
    table: 'hydration-enthalpies.json',
    reference: 'chemicals-crc-aqueous-ions',
    why: 'ΔhydH° of a record derived by the cycle (source derivedCycle) = ΔfH°(ion, aq) (CRC copy) + z·(ΔfH°(H+, g) (JANAF copy) + ΔhydH°(H+)) − ΔfH°(ion, g), the gas term from the gas-ion record where it passed its own check, else from the CRC atom and the pymatgen ionization energies; 2 kJ/mol covers the rounding of four terms and the thermal terms the atom cycle neglects.',
  },
  hydrationMarcusCycle: {
    name: 'hydrationMarcusCycle',
    table: 'hydration-enthalpies.json',
    reference: 'chemicals-crc-aqueous-ions',
    why: "ΔhydH° of a record recalled from Marcus (source marcus1997), compared with the cycle of hydrationCycle on the table's proton value: Marcus built his table by that same cycle, so a figure recalled wrongly shows up, though his printed table itself is in no reachable copy. 2 kJ/mol as in hydrationCycle, plus 0.5 kJ/mol because Marcus prints whole kJ/mol; a larger gap is a gas-phase input that has been revised since (named on the record) or a wrong figure (fixed).",
  },
};

/** References read by a family beside its own (the cycle families combine two copies). */
const EXTRA_REFERENCES = ['chemicals-crc-thermo', 'chemicals-janaf-gas', 'chemicals-perry-cp'];

/** Reads a data table's records and a reference file from a repository root. */
export function loadInputs(root: string): { tables: Record<string, any>; refs: Record<string, ReferenceFile> } {
  const tables: Record<string, any> = {};
  for (const name of new Set([...Object.values(FAMILIES).map((f) => f.table), 'ion-formation-gas.json'])) {
    tables[name] = JSON.parse(readFileSync(join(root, 'data', name), 'utf8'));
  }
  const refs: Record<string, ReferenceFile> = {};
  for (const name of new Set([...Object.values(FAMILIES).map((f) => f.reference), ...EXTRA_REFERENCES])) {
    refs[name] = JSON.parse(readFileSync(join(root, 'tests', 'reference', `${name}.json`), 'utf8'));
  }
  return { tables, refs };
}

/** Hill formula of an element-count map (C and H first when carbon is present, then alphabetical). */
export function hill(composition: Readonly<Record<string, number>>): string {
  const keys = Object.keys(composition).sort();
  const first = 'C' in composition ? ['C', ...('H' in composition ? ['H'] : [])] : [];
  return [...first, ...keys.filter((k) => !first.includes(k))].map((k) => (composition[k] === 1 ? k : `${k}${composition[k]}`)).join('');
}

/** Hill formula of a written formula, water of crystallization included (any formula, salt or not). */
function formulaHill(formula: string): string {
  const syntax = readFormulaSyntax(formula);
  const composition = unitComposition(syntax.units);
  if (syntax.water > 0) {
    composition.set('H', (composition.get('H') ?? 0) + 2 * syntax.water);
    composition.set('O', (composition.get('O') ?? 0) + syntax.water);
  }
  return hill(Object.fromEntries(composition));
}
const saltHill = formulaHill;

/**
 * Hill formulas (keys are Hill formulas: CCaO3, not CaCO3) that several substances share (polymorphs, isomers): the
 * reference entry must carry a label matching the pattern, or the record is
 * not compared at all (NH4SCN is not thiourea, NH4CN is not cyanamide).
 */
const REQUIRED_LABEL: Record<string, RegExp> = {
  CCaO3: /calcite/i,
  O2Ti: /rutile/i,
  CH4N2O: /^urea$/i,
  CH4N2S: /ammonium thiocyanate/i,
  CH4N2: /ammonium cyanide/i,
  C2H7NO2: /ammonium acetate/i,
  CH5NO3: /ammonium (hydrogen carbonate|bicarbonate)/i,
  C12H22O11: /sucrose/i,
  C5H12O5: /xylitol/i,
  C4H10O4: /erythritol|^1,2,3,4-butanetetrol$/i,
  SZn: /sphalerite|^zinc sulfide$/i,
  Al2O3: /corundum|^aluminum oxide( \(α\))?$/i,
};

function pick<T extends { label?: string }>(candidates: T[], key: string): T | undefined {
  const pattern = REQUIRED_LABEL[key];
  const fitting = pattern ? candidates.filter((c) => pattern.test(c.label ?? '')) : candidates;
  if (fitting.length <= 1) return fitting[0];
  // Identical values under two labels are no ambiguity.
  const strip = (c: T) => JSON.stringify({ ...c, cas: 0, label: 0 });
  return fitting.every((c) => strip(c) === strip(fitting[0]!)) ? fitting[0] : undefined;
}

/** The only entry of a list, or undefined when there is none or more than one. */
const one = <T>(list: T[] | undefined): T | undefined => (list && list.length === 1 ? list[0] : undefined);

function group<T>(rows: T[], key: (r: T) => string): Map<string, T[]> {
  const map = new Map<string, T[]>();
  for (const r of rows) {
    const k = key(r);
    const list = map.get(k);
    if (list) list.push(r);
    else map.set(k, [r]);
  }
  return map;
}

const ionKey = (composition: Readonly<Record<string, number>>, charge: number) => `${hill(composition)}|${charge}`;

/** Half a unit in the last decimal place a number is printed with (2.7 → 0.05, 2.664 → 0.0005). */
function halfLastDigit(x: number): number {
  const text = String(x);
  const dot = text.indexOf('.');
  return dot < 0 ? 0.5 : 0.5 * 10 ** -(text.length - dot - 1);
}

function explains(note: unknown, reference: string): boolean {
  return typeof note === 'string' && note.toLowerCase().includes(`differs from ${reference}`);
}

/** True when an llnl.dat reaction is the salt going into its own ions (and its water), with no proton or other species. */
function plainDissolution(reaction: string, salt: { ions: readonly { formula: string; charge: number; count: number }[]; water: number }): boolean {
  const right = reaction.split('=')[1];
  if (!right || reaction.split('=')[0]!.includes(' + ')) return false;
  const terms = right.split(' + ').map((t) => t.trim());
  const expected = salt.ions.map((ion) => {
    const sign = ion.charge > 0 ? '+' : '-';
    const size = Math.abs(ion.charge);
    return `${ion.count === 1 ? '' : `${ion.count} `}${ion.formula}${sign}${size === 1 ? '' : size}`;
  });
  if (salt.water > 0) expected.push(`${salt.water} H2O`);
  return terms.length === expected.length && expected.every((t) => terms.includes(t));
}

/** Runs every comparison; records with no counterpart in a reference produce no check. */
export function crossChecks(tables: Record<string, any>, refs: Record<string, ReferenceFile>): Check[] {
  const checks: Check[] = [];
  const add = (family: string, index: number, record: any, subject: string, ours: number, ref: number, tolerance: number, refLabel: string, field?: string) => {
    const f = FAMILIES[family]!;
    const agree = Math.abs(ours - ref) <= tolerance + 1e-9;
    const note = field ? record[field]?.note : record.note;
    checks.push({ family, table: f.table, index, subject, ours, ref, tolerance, reference: f.reference, refLabel, agree, explained: !agree && explains(note, f.reference), ...(field ? { field } : {}) });
  };
  const recs = (table: string): any[] => tables[table].records;

  // --- CRC thermodynamic properties of substances: formation enthalpies and heat capacities.
  const crcThermo = group(refs['chemicals-crc-thermo']!.records, (r) => `${r.hill}|${r.phase}`);
  const perry = group(refs['chemicals-perry-cp']!.records, (r) => r.hill);
  const janafCp = group(refs['chemicals-janaf-solid-cp']!.records, (r) => r.hill);
  const llnlAll = group(refs['phreeqc-llnl-phases']!.records, (r) => r.hill);
  const llnl = group(refs['phreeqc-llnl-phases']!.records.filter((r) => r.dfH != null), (r) => r.hill);
  const crcFind = (formula: string, phase: string, field: 'dfH' | 'cp') => {
    const key = saltHill(formula);
    return pick((crcThermo.get(`${key}|${phase}`) ?? []).filter((r) => r[field] != null), key);
  };
  recs('compound-formation.json').forEach((r, i) => {
    if (r.phase === 'aq') return;
    const crc = crcFind(r.formula, r.phase, 'dfH');
    if (crc) {
      add('formationCrc', i, r, r.formula, r.value, crc.dfH, Math.max(0.5, 0.0005 * Math.abs(crc.dfH)), `${crc.cas} ${crc.label}`);
      return;
    }
    if (r.phase !== 'cr') return;
    const key = saltHill(r.formula);
    const l = pick((llnl.get(key) ?? []).map((x) => ({ ...x, label: x.phase })), key);
    if (l) add('formationLlnl', i, r, r.formula, r.value, l.dfH, Math.max(1, 0.001 * Math.abs(l.dfH)), `${l.phase} ${l.solid}`);
  });
  recs('heat-capacities.json').forEach((r, i) => {
    const crc = crcFind(r.formula, r.phase, 'cp');
    if (crc) {
      add('heatCapacityCrc', i, r, r.formula, r.value, crc.cp, Math.max(0.5, 0.01 * crc.cp), `${crc.cas} ${crc.label}`);
      return;
    }
    const key = saltHill(r.formula);
    const j = r.phase === 'cr' ? pick(janafCp.get(key) ?? [], key) : undefined;
    if (j) {
      add('heatCapacityJanaf', i, r, r.formula, r.value, j.cp, Math.max(0.5, 0.01 * j.cp), `${j.cas} (JANAF)`);
      return;
    }
    const p = r.phase === 'cr' ? one((perry.get(key) ?? []).filter((x) => x.subphase === null)) : undefined;
    if (!p) return;
    const t = 298.15;
    const cp = 4.184 * (p.a + p.b * t + p.c / (t * t) + p.d * t * t);
    add('heatCapacityPerry', i, r, r.formula, r.value, Number(cp.toFixed(2)), (cp * (p.errorPercent ?? 3)) / 100, `${p.formula} (Perry 2-151)`);
  });

  // --- Warmer melts: the solid hydrate's heat capacity per gram, from Perry's molar constant.
  (tables['warmer-melts.json']?.records ?? []).forEach((r: any, i: number) => {
    const key = saltHill(r.formula);
    const p = one((perry.get(key) ?? []).filter((x) => x.subphase === null));
    if (!p) return;
    const t = 298.15;
    const molar = 4.184 * (p.a + p.b * t + p.c / (t * t) + p.d * t * t);
    const perGram = molar / parseSalt(r.formula).molarMass;
    add('warmerSolidCpPerry', i, r, `${r.formula} solid`, r.solidHeatCapacity.value, Number(perGram.toFixed(4)), 0.03 * perGram, `${p.formula} (Perry 2-151)`, 'solidHeatCapacity');
  });

  // --- CRC densities.
  const densities = group(refs['chemicals-crc-densities']!.records, (r) => r.hill);
  const organicDensities = group(refs['chemicals-crc-organic-densities']!.records, (r) => r.hill);
  recs('crystals.json').forEach((r, i) => {
    if (r.density === undefined) return;
    const key = saltHill(r.formula);
    const d = pick(densities.get(key) ?? [], key);
    if (d) {
      add('densityCrc', i, r, r.formula, r.density, d.density, Math.max(0.015, 0.006 * d.density, halfLastDigit(d.density)), `${d.cas} ${d.label}`);
      return;
    }
    const o = pick(organicDensities.get(key) ?? [], key);
    if (o) add('densityCrcOrganic', i, r, r.formula, r.density, o.density, Math.max(0.015, 0.006 * o.density), `${o.cas} ${o.label}`);
  });

  // --- Ions: composition, aqueous formation enthalpies and heat capacities.
  const ions = new Map<string, any>(recs('ions.json').map((r) => [r.id, r] as const));
  const aq = group(refs['chemicals-crc-aqueous-ions']!.records, (r) => `${r.hill}|${r.charge}`);
  const gas = group(refs['chemicals-atct-gas']!.records, (r) => `${r.hill}|${r.charge}`);
  const aqFor = (id: string, field: 'dfH' | 'cp') => {
    const ion = ions.get(id);
    if (!ion) return undefined;
    const list = (aq.get(ionKey(ion.composition, ion.charge)) ?? []).filter((x) => x[field] != null);
    return list.length === 1 ? list[0] : undefined;
  };
  const shannonIons = new Set(refs['pymatgen-shannon-radii']!.records.map((r) => `${r.element}|${r.charge}`));
  recs('ions.json').forEach((r, i) => {
    const key = ionKey(r.composition, r.charge);
    if (r.kind === 'non-electrolyte') {
      const molecule = pick((crcThermo.get(`${hill(r.composition)}|cr`) ?? []).filter((x) => x.dfH != null), hill(r.composition));
      if (molecule) add('moleculeCompositionCrc', i, r, r.id, 0, 0, 0, `${molecule.cas} ${molecule.label}`);
      return;
    }
    const inAq = aq.get(key);
    if (inAq) add('ionCompositionCrc', i, r, r.id, 0, 0, 0, inAq[0].formula);
    else if (r.kind === 'monatomic' && shannonIons.has(key)) add('ionCompositionShannon', i, r, r.id, 0, 0, 0, `${key.replace('|', ' ')} (Shannon)`);
  });
  recs('ion-formation-aq.json').forEach((r, i) => {
    const ref = aqFor(r.ion, 'dfH');
    if (ref) add('aqueousIonCrc', i, r, r.ion, r.value, ref.dfH, 0.3, ref.formula);
  });
  recs('ion-heat-capacities-aq.json').forEach((r, i) => {
    const ref = aqFor(r.ion, 'cp');
    if (ref) add('aqueousIonCpCrc', i, r, r.ion, r.value, ref.cp, 0.5, ref.formula);
  });

  // --- ATcT gas phase: ions (converted to the electron convention), atoms, diatomic bonds.
  const atct = (composition: Record<string, number>, charge: number) => {
    const list = gas.get(ionKey(composition, charge)) ?? [];
    return list.length === 1 ? list[0] : undefined;
  };
  const janaf = group(refs['chemicals-janaf-gas']!.records, (r) => `${r.hill}|${r.charge}`);
  const crcAtom = (element: string) => pick((crcThermo.get(`${element}|g`) ?? []).filter((x) => x.dfH != null), element);
  const ieRef = new Map(refs['pymatgen-atomic']!.records.filter((r) => r.kind === 'ionization').map((r) => [`${r.element}|${r.stage}`, r] as const));
  recs('ion-formation-gas.json').forEach((r, i) => {
    const ion = ions.get(r.ion);
    if (!ion) return;
    const ref = atct(ion.composition, ion.charge);
    if (ref && ref.dfH != null) {
      const electronConvention = ref.dfH + ion.charge * FIVE_HALVES_RT;
      add('gasIonAtct', i, r, r.ion, r.value, Number(electronConvention.toFixed(3)), 1.5 + 2 * (ref.u ?? 0), `${ref.formula} ${ref.cas}`);
      return;
    }
    const j = one(janaf.get(ionKey(ion.composition, ion.charge)));
    if (j) {
      add('gasIonJanaf', i, r, r.ion, r.value, j.dfH, 1.0, `${j.formula} ${j.cas}`);
      return;
    }
    // Monatomic cations: the cycle over the atom (CRC copy) and the ionization energies (pymatgen copy).
    if (ion.kind !== 'monatomic' || ion.charge <= 0) return;
    const element = Object.keys(ion.composition)[0]!;
    const atom = crcAtom(element);
    const stages = Array.from({ length: ion.charge }, (_, k) => ieRef.get(`${element}|${k + 1}`));
    if (!atom || stages.some((x) => !x)) return;
    const cycle = atom.dfH + stages.reduce((sum, x) => sum + x!.kJ, 0) + ion.charge * FIVE_HALVES_RT;
    add('gasIonCycle', i, r, r.ion, r.value, Number(cycle.toFixed(3)), 2.0, `${atom.cas} ${atom.label} (g) + IE1…IE${ion.charge}`);
  });
  recs('atomization-enthalpies.json').forEach((r, i) => {
    const crc = crcAtom(r.element);
    if (crc) {
      add('atomizationCrc', i, r, r.element, r.value, crc.dfH, 0.5, `${crc.cas} ${crc.label} (g)`);
      return;
    }
    const ref = atct({ [r.element]: 1 }, 0);
    if (ref && ref.dfH != null) add('atomizationAtct', i, r, r.element, r.value, ref.dfH, 1 + 2 * (ref.u ?? 0), `${ref.formula} ${ref.cas}`);
  });
  // Derived hydration enthalpies: the cycle again, from the copies and the gas-ion records that passed.
  const hydration = tables['hydration-enthalpies.json'];
  const protonGas = one(janaf.get('H|1'));
  const gasPassed = new Map(checks.filter((c) => c.table === 'ion-formation-gas.json' && (c.agree || c.explained)).map((c) => [c.subject, c] as const));
  (hydration?.records ?? []).forEach((r: any, i: number) => {
    const family = r.source === 'derivedCycle' ? 'hydrationCycle' : r.source === 'marcus1997' ? 'hydrationMarcusCycle' : undefined;
    // The proton's own value is the scale the cycle takes as given: comparing it would be circular.
    if (!family || !protonGas || r.ion === 'H[+]') return;
    const ion = ions.get(r.ion);
    const aqueous = aqFor(r.ion, 'dfH');
    if (!ion || !aqueous) return;
    let gasValue: number | undefined;
    let gasLabel = '';
    if (gasPassed.has(r.ion)) {
      gasValue = recs('ion-formation-gas.json')[gasPassed.get(r.ion)!.index].value;
      gasLabel = `${r.ion}(g) record`;
    } else if (ion.kind === 'monatomic' && ion.charge > 0) {
      const element = Object.keys(ion.composition)[0]!;
      const atom = crcAtom(element);
      const stages = Array.from({ length: ion.charge }, (_, k) => ieRef.get(`${element}|${k + 1}`));
      if (atom && stages.every(Boolean)) {
        gasValue = atom.dfH + stages.reduce((sum, x) => sum + x!.kJ, 0) + ion.charge * FIVE_HALVES_RT;
        gasLabel = `${atom.label} (g) + IE1…IE${ion.charge}`;
      }
    }
    if (gasValue === undefined) return;
    const cycle = aqueous.dfH + ion.charge * (protonGas.dfH + hydration.protonHydrationEnthalpy) - gasValue;
    add(family, i, r, r.ion, r.value, Number(cycle.toFixed(2)), family === 'hydrationCycle' ? 2.0 : 2.5, `${aqueous.formula} (aq), H+ (g) ${protonGas.dfH}, ${gasLabel}`);
  });

  recs('bond-dissociation.json').forEach((r, i) => {
    const element = r.molecule.replace(/2$/, '');
    const atom = atct({ [element]: 1 }, 0);
    const molecule = atct({ [element]: 2 }, 0);
    if (!atom || !molecule || atom.dfH == null || molecule.dfH == null) return;
    const d = 2 * atom.dfH - molecule.dfH;
    const u = Math.hypot(2 * (atom.u ?? 0), molecule.u ?? 0);
    add('bondAtct', i, r, r.molecule, r.value, Number(d.toFixed(3)), 1 + 2 * u, `2·${atom.formula} − ${molecule.formula}`);
  });

  // --- pymatgen: ionization energies, electron affinities, atomic weights, Shannon radii.
  const atomic = refs['pymatgen-atomic']!.records;
  recs('ionization-energies.json').forEach((r, i) => {
    const ref = ieRef.get(`${r.element}|${r.stage}`);
    if (ref) add('ionizationPymatgen', i, r, `${r.element} stage ${r.stage}`, r.value, ref.kJ, Math.max(0.2, 0.001 * ref.kJ), `${r.element} IE${r.stage} ${ref.eV} eV`);
  });
  const eaRef = new Map(atomic.filter((r) => r.kind === 'affinity').map((r) => [r.element, r] as const));
  recs('electron-affinities.json').forEach((r, i) => {
    const ref = eaRef.get(r.element);
    if (ref) add('affinityPymatgen', i, r, r.element, r.value, ref.kJ, 0.3, `${r.element} EA ${ref.eV} eV`);
  });
  const massRef = new Map(atomic.filter((r) => r.kind === 'mass').map((r) => [r.element, r] as const));
  recs('elements.json').forEach((r, i) => {
    const ref = massRef.get(r.symbol);
    if (!ref) return;
    const interval = /interval \[([\d.]+), ([\d.]+)\]/.exec(r.note ?? '');
    const inside = interval !== null && ref.mass >= Number(interval[1]) && ref.mass <= Number(interval[2]);
    const tolerance = Math.max(0.01, r.uncertainty ?? 0);
    add('massPymatgen', i, r, r.symbol, r.value, inside ? r.value : ref.mass, tolerance, `${r.symbol} ${ref.mass}${inside ? ' (inside the IUPAC interval)' : ''}`);
  });
  const radii = group(refs['pymatgen-shannon-radii']!.records.filter((r) => r.ionic != null), (r) => `${r.element}|${r.charge}|${r.coordination}|${r.spin ?? ''}`);
  recs('shannon-radii.json').forEach((r, i) => {
    const ion = ions.get(r.ion);
    if (!ion || ion.kind !== 'monatomic') return;
    const element = Object.keys(ion.composition)[0]!;
    const list = radii.get(`${element}|${ion.charge}|${r.coordination}|${r.spin ?? ''}`) ?? [];
    // Several sites at one coordination (tetrahedral and square planar): take the plain site, named by its Roman numeral alone.
    const ref = list.length === 1 ? list[0] : list.find((x) => /^[IVX]+$/.test(x.site));
    if (ref) add('shannonPymatgen', i, r, `${r.ion} CN ${r.coordination}${r.spin ? ` ${r.spin}` : ''}`, r.value, ref.ionic, 0.005, `${element}${ion.charge > 0 ? '+' : ''}${ion.charge} ${ref.site}${ref.spin ? ` ${ref.spin}` : ''}`);
  });

  // --- Enthalpies of solution by closure over the two CRC copies.
  const water = pick(crcThermo.get('H2O|l') ?? [], 'H2O');
  recs('solution-enthalpies.json').forEach((r, i) => {
    let salt;
    try {
      salt = parseSalt(r.formula);
    } catch {
      return;
    }
    const anhydrous = crcFind(salt.formula, 'cr', 'dfH');
    if (!anhydrous || salt.kind !== 'ionic') return;
    let sum = -anhydrous.dfH + salt.water * (water?.dfH ?? NaN);
    const labels = [`${anhydrous.cas} ${anhydrous.label}`];
    for (const part of salt.ions) {
      const ref = aqFor(part.ion, 'dfH');
      if (!ref) return;
      sum += part.count * ref.dfH;
      labels.push(ref.formula);
    }
    if (!Number.isFinite(sum)) return;
    add('solutionClosureCrc', i, r, r.formula, r.value, Number(sum.toFixed(3)), 0.5, labels.join(' + '));
  });
  // Solubility products: log K of each phase as llnl.dat writes its reaction, by phase name.
  const llnlByPhase = group(refs['phreeqc-llnl-phases']!.records, (r) => r.phase);
  (tables['solubility-products.json']?.records ?? []).forEach((r: any, i: number) => {
    const l = one(llnlByPhase.get(r.mineral));
    if (l && l.logK != null && l.reaction === r.reaction) add('solubilityProductLlnl', i, r, `${r.formula} (${r.mineral})`, r.logK, l.logK, 0.0001, `${l.phase}: ${l.reaction}`);
  });
  // Where the CRC copies cannot close the cycle: llnl.dat's enthalpy of a plain dissolution (solid = its ions + water).
  const closed = new Set(checks.filter((c) => c.family === 'solutionClosureCrc').map((c) => c.index));
  recs('solution-enthalpies.json').forEach((r, i) => {
    if (closed.has(i)) return;
    let salt;
    try {
      salt = parseSalt(r.formula);
    } catch {
      return;
    }
    const key = formulaHill(r.formula);
    const l = pick((llnlAll.get(key) ?? []).filter((x) => x.dH != null && plainDissolution(x.reaction, salt)).map((x) => ({ ...x, label: x.phase })), key);
    if (l) add('solutionLlnl', i, r, r.formula, r.value, l.dH, 1.0, `${l.phase}: ${l.reaction}`);
  });

  return checks;
}
