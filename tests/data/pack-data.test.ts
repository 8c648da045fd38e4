// Checks on the tables a pack designer leans on (solubility, heat capacities,
// aqueous ion heat capacities, hazards). Each check is built to catch a wrong
// number or a mistyped formula, and names where its expectation comes from.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ionIdSchema, sourcesFileSchema, tableSchemas } from '../../src/data/schemas.js';

const dataDir = join(import.meta.dirname, '..', '..', 'data');
const has = (file: string): boolean => existsSync(join(dataDir, file));
const readJson = (file: string): any => JSON.parse(readFileSync(join(dataDir, file), 'utf8'));
const sources = sourcesFileSchema.parse(readJson('sources.json')).sources;

// ---------------------------------------------------------------------------
// Ion list and a small salt-formula reader for the checks below.

/** The shared ion list every table uses; stands in for data/ions.json until that table exists. */
const SHARED_ION_IDS = [
  'H[+]', 'Li[+]', 'Na[+]', 'K[+]', 'Rb[+]', 'Cs[+]', 'Ag[+]', 'Cu[+]', 'Tl[+]', 'NH4[+]', 'N(CH3)4[+]',
  'Be[2+]', 'Mg[2+]', 'Ca[2+]', 'Sr[2+]', 'Ba[2+]', 'Mn[2+]', 'Fe[2+]', 'Co[2+]', 'Ni[2+]', 'Cu[2+]', 'Zn[2+]',
  'Cd[2+]', 'Hg[2+]', 'Pb[2+]', 'Sn[2+]', 'Al[3+]', 'Fe[3+]', 'Cr[3+]', 'Co[3+]', 'Sc[3+]', 'Y[3+]', 'La[3+]',
  'Ce[3+]', 'Ga[3+]', 'In[3+]', 'Ti[4+]',
  'F[-]', 'Cl[-]', 'Br[-]', 'I[-]', 'O[2-]', 'S[2-]', 'Se[2-]', 'OH[-]', 'HS[-]', 'NO3[-]', 'NO2[-]', 'SO4[2-]',
  'HSO4[-]', 'SO3[2-]', 'CO3[2-]', 'HCO3[-]', 'CH3COO[-]', 'HCOO[-]', 'ClO4[-]', 'ClO3[-]', 'BrO3[-]', 'IO3[-]',
  'SCN[-]', 'CN[-]', 'OCN[-]', 'MnO4[-]', 'PO4[3-]', 'HPO4[2-]', 'H2PO4[-]', 'S2O3[2-]', 'BF4[-]', 'CrO4[2-]',
  'Cr2O7[2-]', 'C2O4[2-]', 'N3[-]',
  'CO(NH2)2[0]', 'C5H12O5[0]', 'C4H10O4[0]', 'C12H22O11[0]',
];

interface Ion {
  id: string;
  formula: string;
  charge: number;
  monatomic: boolean;
}

function chargeOfId(id: string): number {
  const m = /\[(0|(\d?)([+-]))\]$/.exec(id);
  if (!m) throw new Error(`not an ion id: ${id}`);
  if (m[1] === '0') return 0;
  return (m[2] ? Number(m[2]) : 1) * (m[3] === '+' ? 1 : -1);
}
const formulaOfId = (id: string): string => id.slice(0, id.lastIndexOf('['));
const isMonatomic = (formula: string): boolean => /^[A-Z][a-z]?$/.test(formula);

/** The ions the checks resolve formulas against: data/ions.json where present, else the shared list. */
const ions: Ion[] = (() => {
  if (has('ions.json')) {
    const records = readJson('ions.json').records as Array<{ id: string; formula: string; charge: number; kind: string; aliases?: string[] }>;
    return records.flatMap((r) =>
      [r.formula, ...(r.aliases ?? [])].map((formula) => ({ id: r.id, formula, charge: r.charge, monatomic: r.kind === 'monatomic' })),
    );
  }
  return SHARED_ION_IDS.map((id) => {
    const formula = formulaOfId(id);
    return { id, formula, charge: chargeOfId(id), monatomic: isMonatomic(formula) };
  });
})();
const ionIds = new Set(ions.map((i) => i.id));
// Longest formulas first so the reader tries `NO3` before `N` and `CH3COO` before `C`.
const ionsByLength = [...ions].sort((a, b) => b.formula.length - a.formula.length);

/**
 * Reads a salt formula written the canonical way (cations first, then anions,
 * parentheses only round a polyatomic ion counted more than once, an optional
 * `·nH2O`) into its ions. Returns null when no reading balances the charges.
 */
function readSalt(text: string): { parts: Array<[Ion, number]>; water: number } | null {
  const pieces = text.split('·');
  if (pieces.length > 2) return null;
  let water = 0;
  if (pieces.length === 2) {
    const m = /^(\d+(?:\.\d+)?)?H2O$/.exec(pieces[1]!);
    if (!m) return null;
    water = m[1] ? Number(m[1]) : 1;
  }
  const core = pieces[0]!;
  const neutral = ions.find((i) => i.charge === 0 && i.formula === core);
  if (neutral) return { parts: [[neutral, 1]], water };

  const walk = (at: number, anionsBegun: boolean, acc: Array<[Ion, number]>): Array<[Ion, number]> | null => {
    if (at === core.length) {
      const cations = acc.some(([i]) => i.charge > 0);
      const anions = acc.some(([i]) => i.charge < 0);
      const balance = acc.reduce((s, [i, n]) => s + i.charge * n, 0);
      return cations && anions && balance === 0 ? acc : null;
    }
    for (const ion of ionsByLength) {
      if (ion.charge === 0 || (anionsBegun && ion.charge > 0)) continue;
      const next = anionsBegun || ion.charge < 0;
      if (core.startsWith(`(${ion.formula})`, at)) {
        if (ion.monatomic) continue;
        const digits = /^\d+/.exec(core.slice(at + ion.formula.length + 2))?.[0];
        if (!digits || Number(digits) < 2) continue;
        const found = walk(at + ion.formula.length + 2 + digits.length, next, [...acc, [ion, Number(digits)]]);
        if (found) return found;
      } else if (core.startsWith(ion.formula, at)) {
        const after = at + ion.formula.length;
        const digits = /^\d+/.exec(core.slice(after))?.[0];
        if (digits && !ion.monatomic) continue;
        const count = digits ? Number(digits) : 1;
        if (digits && count < 2) continue;
        const found = walk(after + (digits?.length ?? 0), next, [...acc, [ion, count]]);
        if (found) return found;
      }
    }
    return null;
  };
  const parts = walk(0, false, []);
  return parts ? { parts, water } : null;
}

/** The anhydrous formula and the number of waters of a hydrate formula. */
function splitHydrate(formula: string): { anhydrous: string; water: number } {
  const [anhydrous, hydrate] = formula.split('·');
  if (!hydrate) return { anhydrous: anhydrous!, water: 0 };
  const m = /^(\d+(?:\.\d+)?)?H2O$/.exec(hydrate);
  if (!m) throw new Error(`not a hydrate: ${formula}`);
  return { anhydrous: anhydrous!, water: m[1] ? Number(m[1]) : 1 };
}

describe('the salt-formula reader used by these checks', () => {
  it('reads canonical formulas and rejects miswritten ones', () => {
    for (const ok of ['NaCl', 'CaCl2·6H2O', '(NH4)2SO4', 'Ca(NO3)2·4H2O', 'KAl(SO4)2·12H2O', 'NaCH3COO·3H2O', 'Na2S2O3·5H2O', 'NH4NO3', 'N(CH3)4Cl', 'CO(NH2)2', 'K2Cr2O7', 'MgSO4·H2O']) {
      expect(readSalt(ok), ok).not.toBeNull();
    }
    // unbalanced, anion first, polyatomic count without parentheses, unknown ion
    for (const bad of ['NaCl2', 'ClNa', 'NH42SO4', 'Ca(NO3)', 'NaXy', 'CaCl2·6H2', 'KAl(SO4)2·12H2O·H2O']) {
      expect(readSalt(bad), bad).toBeNull();
    }
  });
});

// ---------------------------------------------------------------------------
// Solubility

type SolRecord = { formula: string; solidPhase?: string; points: Array<{ t: number; value: number; solidPhase?: string }>; eutectic?: { temperature: number; massFraction: number; source?: string }; source: string };

describe.runIf(has('solubility.json'))('solubility.json', () => {
  const table = tableSchemas['solubility.json'].parse(readJson('solubility.json'));
  const records = table.records as SolRecord[];
  const byFormula = new Map(records.map((r) => [r.formula, r]));
  const at = (formula: string, t: number): number => {
    const p = byFormula.get(formula)?.points.find((q) => q.t === t);
    if (!p) throw new Error(`${formula} has no point at ${t} °C`);
    return p.value;
  };
  const w = (r: number): number => r / (100 + r);

  it('covers at least 22 pack candidates, each from 0–30 °C up to at least 40 °C where the source allows', () => {
    expect(records.length).toBeGreaterThanOrEqual(22);
    for (const name of ['NH4NO3', 'NH4Cl', 'KNO3', 'KCl', 'NaCl', 'CO(NH2)2', 'CaCl2', 'MgSO4', 'Na2SO4', 'NaCH3COO', 'Na2S2O3', 'Na2CO3']) {
      expect(byFormula.has(name), name).toBe(true);
    }
    // The source stops short of 40 °C where the salt decomposes in warm water:
    // NH4HCO3 loses ammonia and carbon dioxide above about 36 °C (The Merck Index).
    const decomposesBelow40 = new Set(['NH4HCO3']);
    // The CRC table (crcSolubility; tests/reference/crc-solubility.json) gives only a few temperatures for these
    // sparingly soluble or rarely measured salts; their records keep what the source gives.
    const sparseInSource = new Set(['BaF2', 'CaF2', 'CdF2', 'LiF', 'MnF2', 'NH4SCN', 'NiF2', 'PbF2', 'SrF2']);
    for (const r of records) {
      const ts = r.points.map((p) => p.t);
      if (sparseInSource.has(r.formula)) continue;
      expect(Math.min(...ts), r.formula).toBeLessThanOrEqual(20);
      expect(Math.max(...ts), r.formula).toBeGreaterThanOrEqual(decomposesBelow40.has(r.formula) ? 30 : 40);
    }
  });

  it('keeps every point strictly sorted by temperature and within 0–120 °C (schema convention)', () => {
    for (const r of records) {
      r.points.forEach((p, i) => {
        expect(p.t, r.formula).toBeGreaterThanOrEqual(0);
        expect(p.t, r.formula).toBeLessThanOrEqual(120);
        if (i > 0) expect(p.t, `${r.formula} at ${p.t}`).toBeGreaterThan(r.points[i - 1]!.t);
      });
    }
  });

  it('writes every formula canonically and every solid as the salt or one of its hydrates', () => {
    for (const r of records) {
      const salt = readSalt(r.formula);
      expect(salt, r.formula).not.toBeNull();
      expect(salt!.water, `${r.formula} must be the anhydrous salt`).toBe(0);
      const solids = [r.solidPhase, ...r.points.map((p) => p.solidPhase)].filter((s): s is string => s !== undefined);
      for (const solid of solids) {
        expect(readSalt(solid), solid).not.toBeNull();
        expect(splitHydrate(solid).anhydrous, `${solid} is a solid of ${r.formula}`).toBe(r.formula);
      }
    }
  });

  it('cites a known source for every record and every separately cited eutectic', () => {
    for (const r of records) {
      expect(r.source in sources, r.formula).toBe(true);
      if (r.eutectic?.source) expect(r.eutectic.source in sources, `${r.formula} eutectic`).toBe(true);
    }
  });

  it('has NaCl nearly flat, 35.6–36.6 g/100 g over 0–40 °C (CRC: 26.28–26.67 mass %)', () => {
    const nacl = byFormula.get('NaCl')!.points.filter((p) => p.t <= 40).map((p) => p.value);
    expect(nacl.length).toBeGreaterThanOrEqual(5);
    for (const v of nacl) {
      expect(v).toBeGreaterThanOrEqual(35.6);
      expect(v).toBeLessThanOrEqual(36.6);
    }
    expect(Math.max(...nacl) - Math.min(...nacl)).toBeLessThan(1);
  });

  it('has KNO3 rising steeply, about 13 g at 0 °C to about 63 g at 40 °C (CRC 12.0 and 38.6 mass %)', () => {
    expect(at('KNO3', 0)).toBeGreaterThan(12.5);
    expect(at('KNO3', 0)).toBeLessThan(14.5);
    expect(at('KNO3', 40)).toBeGreaterThan(60);
    expect(at('KNO3', 40)).toBeLessThan(66);
  });

  it('converts mass percent to g per 100 g of water, not the reverse (CRC NH4NO3 68.0 % at 25 °C = 212.5 g; KCl 26.22 % = 35.5 g)', () => {
    expect(at('NH4NO3', 25)).toBeCloseTo(212.5, 0);
    expect(at('KCl', 25)).toBeCloseTo(35.54, 1);
    expect(100 * w(at('CaCl2', 25))).toBeCloseTo(44.83, 1);
  });

  it('records the CaCl2·6H2O solid below its 29.8 °C transition and a lower hydrate above it (CRC marks the change)', () => {
    const cacl2 = byFormula.get('CaCl2')!;
    const solidAt = (t: number) => cacl2.points.find((p) => p.t === t)!.solidPhase ?? cacl2.solidPhase;
    expect(solidAt(20)).toBe('CaCl2·6H2O');
    expect(solidAt(25)).toBe('CaCl2·6H2O');
    expect(solidAt(40)).not.toBe('CaCl2·6H2O');
    expect(byFormula.get('Na2SO4')!.solidPhase).toBe('Na2SO4·10H2O');
    expect(byFormula.get('MgSO4')!.solidPhase).toBe('MgSO4·7H2O');
  });

  it('puts every eutectic below 0 °C (water freezes at 0 °C; a solute only lowers it)', () => {
    const withEutectic = records.filter((r) => r.eutectic);
    expect(withEutectic.length).toBeGreaterThanOrEqual(10);
    for (const r of withEutectic) expect(r.eutectic!.temperature, r.formula).toBeLessThan(0);
  });

  it('puts the eutectic liquid below the saturation mass fraction at the lowest tabulated temperature, for salts whose solubility rises (phase-diagram geometry, common practice)', () => {
    for (const r of records) {
      if (!r.eutectic || r.points.length < 2) continue;
      const [first, second] = r.points;
      if (second!.value <= first!.value) continue;
      expect(r.eutectic.massFraction, r.formula).toBeLessThan(w(first!.value));
    }
  });

  it('has the NaCl eutectic at −21.1 °C and 23.3 % NaCl (Lange 1999, Table 5.13)', () => {
    const e = byFormula.get('NaCl')!.eutectic!;
    expect(e.temperature).toBeCloseTo(-21.1, 1);
    expect(e.massFraction).toBeCloseTo(0.233, 3);
  });

  it('keeps the brine eutectic order CaCl2 < NaCl < NH4Cl < KCl < Na2SO4 (common practice for freezing mixtures)', () => {
    const e = (f: string) => byFormula.get(f)!.eutectic!.temperature;
    expect(e('CaCl2')).toBeLessThan(e('NaCl'));
    expect(e('NaCl')).toBeLessThan(e('NH4Cl'));
    expect(e('NH4Cl')).toBeLessThan(e('KCl'));
    expect(e('KCl')).toBeLessThan(e('Na2SO4'));
  });
});

// ---------------------------------------------------------------------------
// Heat capacities of solids and of aqueous ions

const R = 8.314462618; // J/(mol·K), CODATA 2018 exact-by-definition value of the molar gas constant

/** Number of atoms in a formula unit, counting parentheses and a hydrate. */
function atomCount(formula: string): number {
  const [core, hydrate] = formula.split('·');
  const count = (text: string): number => {
    let total = 0;
    const re = /\(([^()]*(?:\([^()]*\)[^()]*)*)\)(\d*)|([A-Z][a-z]?)(\d*)/g;
    for (const m of text.matchAll(re)) {
      if (m[1] !== undefined) total += count(m[1]) * (m[2] ? Number(m[2]) : 1);
      else total += m[4] ? Number(m[4]) : 1;
    }
    return total;
  };
  let n = count(core!);
  if (hydrate) n += 3 * splitHydrate(formula).water;
  return n;
}

describe.runIf(has('heat-capacities.json'))('heat-capacities.json', () => {
  const records = tableSchemas['heat-capacities.json'].parse(readJson('heat-capacities.json')).records;
  const cp = new Map(records.map((r) => [`${r.formula}|${r.phase}`, r.value]));

  it('has liquid water at 75.29 J/(mol·K) (NBS tables; the figure every Kirchhoff step uses)', () => {
    expect(cp.get('H2O|l')).toBeCloseTo(75.291, 2);
  });

  it('has the pack salts and urea as crystals', () => {
    for (const f of ['NH4NO3', 'NH4Cl', 'KNO3', 'KCl', 'NaCl', 'CaCl2', 'MgSO4', 'Na2SO4', 'Na2CO3', 'NaCH3COO', 'CO(NH2)2']) {
      expect(cp.has(`${f}|cr`), f).toBe(true);
    }
  });

  it('writes every crystal formula canonically', () => {
    for (const r of records.filter((q) => q.phase === 'cr')) expect(readSalt(r.formula), r.formula).not.toBeNull();
  });

  it('keeps every crystal below 1.15 × 3R per atom (Dulong–Petit ceiling plus the Cp − Cv excess; common practice)', () => {
    for (const r of records.filter((q) => q.phase === 'cr')) {
      expect(r.value, r.formula).toBeLessThan(1.15 * 3 * R * atomCount(r.formula));
    }
  });

  it('has the alkali halides near the Dulong–Petit value 6R ≈ 50 J/(mol·K), within 45–54 (NBS tables)', () => {
    for (const f of ['NaF', 'NaCl', 'NaBr', 'NaI', 'KF', 'KCl', 'KBr', 'KI', 'RbCl', 'CsCl']) {
      const v = cp.get(`${f}|cr`);
      if (v === undefined) continue;
      expect(v, f).toBeGreaterThan(45);
      expect(v, f).toBeLessThan(54);
    }
  });

  it('adds roughly 30–46 J/(mol·K) per water of crystallisation over the anhydrous salt (Neumann–Kopp; common practice)', () => {
    let pairs = 0;
    for (const r of records.filter((q) => q.phase === 'cr' && q.formula.includes('·'))) {
      const { anhydrous, water } = splitHydrate(r.formula);
      const base = cp.get(`${anhydrous}|cr`);
      if (base === undefined) continue;
      pairs += 1;
      const perWater = (r.value - base) / water;
      expect(perWater, r.formula).toBeGreaterThan(30);
      expect(perWater, r.formula).toBeLessThan(46);
    }
    expect(pairs).toBeGreaterThanOrEqual(5);
  });
});

describe.runIf(has('ion-heat-capacities-aq.json'))('ion-heat-capacities-aq.json', () => {
  const records = tableSchemas['ion-heat-capacities-aq.json'].parse(readJson('ion-heat-capacities-aq.json')).records;
  const ion = new Map(records.map((r) => [r.ion, r.value]));
  const crystal = has('heat-capacities.json')
    ? new Map(tableSchemas['heat-capacities.json'].parse(readJson('heat-capacities.json')).records.filter((r) => r.phase === 'cr').map((r) => [r.formula, r.value]))
    : new Map<string, number>();

  it('uses ids of the ion list, with H+ exactly zero (conventional scale)', () => {
    for (const r of records) {
      expect(ionIdSchema.safeParse(r.ion).success, r.ion).toBe(true);
      expect(ionIds.has(r.ion), r.ion).toBe(true);
    }
    expect(ion.get('H[+]')).toBe(0);
  });

  it('gives Cp°(NaCl, aq) = −90 and Cp°(KCl, aq) = −114.6 J/(mol·K) as sums (NBS tables, whole-electrolyte values)', () => {
    expect(ion.get('Na[+]')! + ion.get('Cl[-]')!).toBeCloseTo(-90.0, 1);
    expect(ion.get('K[+]')! + ion.get('Cl[-]')!).toBeCloseTo(-114.6, 1);
  });

  it('has negative Cp° for the halide, hydroxide, nitrate and sulfate ions on this scale (NBS tables; a sign slip shows here)', () => {
    for (const id of ['F[-]', 'Cl[-]', 'Br[-]', 'I[-]', 'OH[-]', 'NO3[-]', 'SO4[2-]']) {
      if (ion.has(id)) expect(ion.get(id)!, id).toBeLessThan(0);
    }
  });

  it('makes ΔsolCp° = ΣνCp°(ion, aq) − Cp°(cr) negative for every salt both tables cover (common practice: dissolving an electrolyte lowers Cp)', () => {
    let checked = 0;
    for (const [formula, cpCr] of crystal) {
      const salt = readSalt(formula);
      if (!salt || salt.water > 0 || salt.parts.some(([i]) => i.charge === 0)) continue;
      if (salt.parts.some(([i]) => !ion.has(i.id))) continue;
      const dsol = salt.parts.reduce((s, [i, n]) => s + n * ion.get(i.id)!, 0) - cpCr;
      expect(dsol, formula).toBeLessThan(0);
      checked += 1;
    }
    expect(checked).toBeGreaterThanOrEqual(10);
  });
});

// ---------------------------------------------------------------------------
// Hazards

describe.runIf(has('hazards.json'))('hazards.json', () => {
  const records = tableSchemas['hazards.json'].parse(readJson('hazards.json')).records;
  const bySubject = new Map(records.map((r) => [r.subject, r]));
  const ionIdForm = /^[A-Za-z0-9()]{1,40}\[(?:0|[1-9]?[+-])\]$/;

  it('names every subject as a canonical salt formula or an ion id of the ion list (data/ions.json when present, else the shared list)', () => {
    for (const r of records) {
      if (r.subject.includes('[')) {
        expect(r.subject, r.subject).toMatch(ionIdForm);
        expect(ionIds.has(r.subject), `${r.subject} is not in the ion list`).toBe(true);
      } else {
        expect(readSalt(r.subject), r.subject).not.toBeNull();
        expect(r.subject.includes('·'), `${r.subject}: hydrates share the anhydrous entry`).toBe(false);
      }
    }
  });

  it('lists each class once and keeps statements short and plain', () => {
    for (const r of records) {
      expect(new Set(r.classes).size, r.subject).toBe(r.classes.length);
      expect(r.statement.length, r.subject).toBeLessThan(400);
      // CLP class codes belong in the note, not in the plain-words statement
      expect(r.statement, r.subject).not.toMatch(/\b(?:H\d{3}|EUH\d{3}|Ox\. Sol\.|Acute Tox\.)/);
    }
  });

  it('marks ammonium nitrate as an oxidising, restricted explosives precursor (Regulation (EU) 2019/1148, Annex I)', () => {
    const an = bySubject.get('NH4NO3');
    expect(an).toBeDefined();
    expect(an!.classes).toEqual(expect.arrayContaining(['oxidizer', 'explosive-precursor', 'restricted']));
    expect(an!.statement).toMatch(/restricted in some jurisdictions/);
  });

  it('marks the chlorates and perchlorates as oxidisers and restricted precursors, and the alkali and calcium nitrates as reportable precursors (Regulation (EU) 2019/1148, Annexes I and II)', () => {
    for (const s of ['KClO3', 'NaClO3', 'KClO4', 'NaClO4', 'ClO3[-]', 'ClO4[-]']) {
      expect(bySubject.get(s)?.classes, s).toEqual(expect.arrayContaining(['oxidizer', 'explosive-precursor', 'restricted']));
    }
    for (const s of ['KNO3', 'NaNO3', 'Ca(NO3)2']) expect(bySubject.get(s)?.classes, s).toContain('explosive-precursor');
  });

  it('has CaCl2 as an eye irritant (CLP Annex VI, Eye Irrit. 2) and the hexavalent-chromium ions as carcinogens (CLP Annex VI, Carc. 1B)', () => {
    expect(bySubject.get('CaCl2')?.classes).toContain('irritant');
    expect(bySubject.get('CrO4[2-]')?.classes).toContain('carcinogen');
    expect(bySubject.get('Cr2O7[2-]')?.classes).toContain('carcinogen');
  });

  it('covers the ions whose hazard follows the ion', () => {
    for (const s of ['CrO4[2-]', 'Cr2O7[2-]', 'CN[-]', 'Ba[2+]', 'Tl[+]', 'Cd[2+]', 'Hg[2+]', 'Pb[2+]', 'NO2[-]', 'ClO3[-]', 'ClO4[-]', 'MnO4[-]']) {
      expect(bySubject.has(s), s).toBe(true);
    }
  });

  it('leaves out salts with no significant hazard at pack scale (no harmonised CLP entry)', () => {
    for (const s of ['NaCl', 'KCl', 'MgSO4', 'Na2SO4', 'CO(NH2)2', 'NaCH3COO']) expect(bySubject.has(s), s).toBe(false);
  });
});
