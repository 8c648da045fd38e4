/**
 * `npm run solubility-products`: reads the PHASES of the PHREEQC database
 * llnl.dat (public domain, USGS; ../shared/reference/phreeqc/, see its
 * README for the repository and commit) and writes data/solubility-products.json:
 * for every phase that is one salt of our ion table, the dissolution
 * reaction and log K at 25 °C as the file gives them, and the solubility
 * product in the salt's own ions.
 *
 * llnl.dat writes some reactions with a protonated form of the anion (a
 * hydroxide dissolves with H⁺ to water, a carbonate to HCO₃⁻, a phosphate to
 * HPO₄²⁻, a sulfide to HS⁻). Such a reaction is turned into MₐXᵦ = a M + b X
 * by adding b times the file's own reaction Y = X + H⁺ (H₂O = OH⁻ + H⁺,
 * HCO₃⁻ = CO₃²⁻ + H⁺, HPO₄²⁻ = PO₄³⁻ + H⁺, HS⁻ = S²⁻ + H⁺): log Ksp = log K + b·log K(Y).
 * Reactions with any other species (redox, complexes, double salts) are left out.
 *
 * Run by hand when the reference copy changes, from the project folder, with
 * the path of llnl.dat as its argument where it is not ../shared/reference/phreeqc/;
 * not part of the tests.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { builtinDataset } from '../../data/builtin.js';
import { parseSalt } from '../../chem/parseSalt.js';
import type { Salt } from '../../chem/salt.js';
import { isIonheatError } from '../../error.js';

const dataset = builtinDataset();
/** The reference copy: the first argument, else ../shared/reference/phreeqc/llnl.dat beside the checkout. */
const REFERENCE = resolve(process.argv[2] ?? '../shared/reference/phreeqc/llnl.dat');
const TARGET = fileURLToPath(new URL('../../../data/solubility-products.json', import.meta.url));
const REPOSITORY = 'usgs-coupled/phreeqc3';
const COMMIT = '8176af0c5e28ac469227b932f89fac3a29d5909c';

/** The protonated form llnl.dat writes for an anion of ours, and the species line that deprotonates it. */
const PROTONATED: Record<string, { species: string; reaction: string }> = {
  'OH[-]': { species: 'H2O', reaction: 'H2O = OH- + H+' },
  'CO3[2-]': { species: 'HCO3-', reaction: 'HCO3- = CO3-2 + H+' },
  'PO4[3-]': { species: 'HPO4-2', reaction: 'HPO4-2 = PO4-3 + H+' },
  'S[2-]': { species: 'HS-', reaction: 'HS- = S-2 + H+' },
};

/** An llnl.dat species name (`Ca+2`, `Cl-`, `SO4-2`, `Fe++`) as an ion id of ours (`Ca[2+]`). */
function ionId(species: string): string | undefined {
  const m = /^(.*?)([+-])(\d*|\+*|-*)$/.exec(species);
  if (!m) return undefined;
  const [, body, sign, rest] = m as unknown as [string, string, string, string];
  const n = rest === '' ? 1 : /^\d+$/.test(rest) ? Number(rest) : rest.length + 1;
  return `${body}[${n === 1 ? '' : n}${sign}]`;
}

interface Term {
  coefficient: number;
  species: string;
}
function terms(side: string): Term[] {
  return side
    .split(/\s+\+\s+/)
    .map((t) => t.trim())
    .filter((t) => t !== '')
    .map((t) => {
      const m = /^([\d.]+)\s+(\S+)$/.exec(t);
      return m ? { coefficient: Number(m[1]), species: m[2]! } : { coefficient: 1, species: t.replace(/^\+\s*/, '') };
    });
}

/** log K of a species reaction of the SOLUTION_SPECIES section, by its reaction line. */
function speciesLogK(text: string, reaction: string): number {
  const lines = text.split('\n');
  const at = lines.findIndex((l) => l.trim() === reaction);
  if (at < 0) throw new Error(`llnl.dat has no species line "${reaction}"`);
  for (let k = at + 1; k < at + 6; k++) {
    const m = /^\s*log_k\s+(-?[\d.]+)/.exec(lines[k]!);
    if (m) return Number(m[1]);
  }
  throw new Error(`no log_k after "${reaction}"`);
}

interface Phase {
  name: string;
  reaction: string;
  logK: number;
  deltaH?: string;
}
function phases(text: string): Phase[] {
  const start = text.indexOf('\nPHASES');
  const end = text.indexOf('\nEXCHANGE_MASTER_SPECIES');
  const lines = text.slice(start, end).split('\n');
  const out: Phase[] = [];
  for (let i = 0; i + 2 < lines.length; i++) {
    const name = lines[i]!;
    if (!/^[A-Za-z]/.test(name) || name.startsWith('PHASES')) continue;
    const reaction = lines[i + 1]!.trim();
    const k = /^\s*log_k\s+(-?[\d.]+)/.exec(lines[i + 2]!);
    if (!reaction.includes('=') || !k) continue;
    out.push({ name: name.trim(), reaction, logK: Number(k[1]) });
  }
  return out;
}

function sameAmount(a: number, b: number): boolean {
  return Math.abs(a - b) < 1e-6;
}

const text = readFileSync(REFERENCE, 'utf8');
const records: object[] = [];
const skipped: string[] = [];
for (const phase of phases(text)) {
  const [left, right] = phase.reaction.split('=').map((s) => s.trim()) as [string, string];
  const leftTerms = terms(left);
  const solidText = leftTerms[0]!.species.replace(':', '·');
  let salt: Salt;
  try {
    salt = parseSalt(solidText, dataset);
  } catch (e) {
    if (!isIonheatError(e)) throw e;
    continue;
  }
  if (salt.kind !== 'ionic' || salt.ions.length !== 2 || leftTerms[0]!.coefficient !== 1) continue;
  const [cation, anion] = salt.ions as [Salt['ions'][number], Salt['ions'][number]];
  const protons = leftTerms.slice(1).reduce((sum, t) => (t.species === 'H+' ? sum + t.coefficient : Number.NaN), 0);
  if (Number.isNaN(protons)) {
    skipped.push(`${phase.name}: ${phase.reaction}`);
    continue;
  }
  const products = terms(right);
  const amount = (species: string): number => products.filter((t) => t.species === species).reduce((s, t) => s + t.coefficient, 0);
  const protonated = PROTONATED[anion.ion];
  let logKsp = phase.logK;
  let conversion: string | undefined;
  let ok = products.every((t) => t.species === 'H2O' || ionId(t.species) === cation.ion || ionId(t.species) === anion.ion || t.species === protonated?.species);
  ok &&= sameAmount(products.filter((t) => ionId(t.species) === cation.ion).reduce((s, t) => s + t.coefficient, 0), cation.count);
  const anionDirect = products.filter((t) => ionId(t.species) === anion.ion).reduce((s, t) => s + t.coefficient, 0);
  if (ok && protons === 0 && sameAmount(anionDirect, anion.count)) {
    ok = sameAmount(amount('H2O'), salt.water);
  } else if (ok && protonated && sameAmount(protons, anion.count) && anionDirect === 0) {
    const expected = protonated.species === 'H2O' ? salt.water + anion.count : salt.water;
    ok = sameAmount(amount('H2O'), expected) && (protonated.species === 'H2O' || sameAmount(amount(protonated.species), anion.count));
    if (ok) {
      const k = speciesLogK(text, protonated.reaction);
      logKsp = phase.logK + anion.count * k;
      conversion = `${anion.count} × (${protonated.reaction}), log K ${k} (llnl.dat SOLUTION_SPECIES)`;
    }
  } else ok = false;
  if (!ok) {
    skipped.push(`${phase.name}: ${phase.reaction}`);
    continue;
  }
  records.push({
    formula: salt.formula,
    mineral: phase.name,
    reaction: phase.reaction,
    logK: phase.logK,
    ...(conversion ? { conversion } : {}),
    value: Math.round(logKsp * 1e4) / 1e4,
    unit: 'log10',
    uncertainty: null,
    source: 'llnlDat',
    fromMemory: false,
  });
}

const table = {
  title: 'Solubility products at 25 °C from llnl.dat',
  description:
    'log10 of the solubility product Ksp = a(M)^a · a(X)^b · a(H2O)^w of the salt MaXb·wH2O dissolving to its own ions at 25 °C and 1 bar, from the PHASES of the PHREEQC database llnl.dat (thermo.com.V8.R6), extracted by src/node/scripts/solubilityProducts.ts.',
  unit: 'log10',
  defaultUncertainty: 0.3,
  defaultUncertaintyNote:
    'No uncertainty is given in llnl.dat. 0.3 in log10 is typical of the spread between compilations for sparingly soluble salts (common practice); the estimate of a solubility from it carries larger terms (activity coefficients, hydrolysis, complexes), added where the solubility is estimated.',
  conventions: `value = log10 Ksp in the salt's own ions (mol/kg standard state). reaction and logK are as written in llnl.dat; conversion names the species reactions of the same file added to reach the salt's own ions. File ../shared/reference/phreeqc/llnl.dat, repository ${REPOSITORY}, commit ${COMMIT}.`,
  records,
};
writeFileSync(TARGET, `${JSON.stringify(table, null, 2)}\n`);
process.stdout.write(`wrote ${records.length} records to ${TARGET}; ${skipped.length} phases of our salts left out (other species in the reaction)\n`);
for (const s of skipped) process.stdout.write(`  left out ${s}\n`);
