/**
 * `npm run provenance`: per data table, how many records were checked against
 * an open copy of their source (and which), and how many remain entered from
 * memory; per comparison family, how many records agree within the family's
 * tolerance and how many differ with the reason on the record. Prints the
 * tables and writes them to docs/provenance.md (never edited by hand).
 *
 * @module
 */
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tableSchemas } from '../../data/schemas.js';
import { FAMILIES, crossChecks, loadInputs } from './reference/crossCheck.js';
import { UNREACHABLE } from './reference/unreachable.js';

const root = join(import.meta.dirname, '..', '..', '..');
const { tables, refs } = loadInputs(root);
const checks = crossChecks(tables, refs);

const percent = (n: number, d: number) => (d === 0 ? '–' : `${((100 * n) / d).toFixed(1)} %`);

// Per table.
const tableRows: string[][] = [];
let total = 0;
let checkedTotal = 0;
let memoryTotal = 0;
for (const name of Object.keys(tableSchemas)) {
  const records: any[] = JSON.parse(readFileSync(join(root, 'data', name), 'utf8')).records;
  const checked = records.filter((r) => typeof r.checkedAgainst === 'string');
  const byCopy = new Map<string, number>();
  for (const r of checked) {
    // Keep what was compared (the parenthesis): a cycle or closure over a copy is not the same as the copy's own number.
    const copy = (r.checkedAgainst as string).replaceAll('tests/reference/', '').replaceAll('.json', '');
    byCopy.set(copy, (byCopy.get(copy) ?? 0) + 1);
  }
  const memory = records.filter((r) => r.fromMemory === true).length;
  const otherwise = records.length - checked.length - memory;
  total += records.length;
  checkedTotal += checked.length;
  memoryTotal += memory;
  tableRows.push([
    name,
    String(records.length),
    `${checked.length} (${percent(checked.length, records.length)})`,
    [...byCopy].map(([copy, n]) => `${copy}: ${n}`).join('; ') || '–',
    String(memory),
    String(otherwise),
  ]);
}
tableRows.push(['**all tables**', String(total), `**${checkedTotal} (${percent(checkedTotal, total)})**`, '', String(memoryTotal), String(total - checkedTotal - memoryTotal)]);

// Quantities nested inside records (each with its own provenance, as in warmer-melts.json).
const nestedRows: string[][] = [];
for (const name of Object.keys(tableSchemas)) {
  const records: any[] = JSON.parse(readFileSync(join(root, 'data', name), 'utf8')).records;
  const byField = new Map<string, { all: number; checked: number; memory: number }>();
  for (const r of records) {
    for (const [field, value] of Object.entries(r)) {
      if (!value || typeof value !== 'object' || Array.isArray(value) || typeof (value as any).fromMemory !== 'boolean') continue;
      const count = byField.get(field) ?? { all: 0, checked: 0, memory: 0 };
      count.all++;
      if (typeof (value as any).checkedAgainst === 'string') count.checked++;
      if ((value as any).fromMemory === true) count.memory++;
      byField.set(field, count);
    }
  }
  for (const [field, c] of byField) nestedRows.push([name, field, String(c.all), String(c.checked), String(c.memory)]);
}

// Per family.
const familyRows = Object.values(FAMILIES).map((f) => {
  const list = checks.filter((c) => c.family === f.name);
  const agree = list.filter((c) => c.agree).length;
  const explained = list.filter((c) => c.explained).length;
  const open = list.length - agree - explained;
  return [f.name, f.table, f.reference, String(list.length), String(agree), percent(agree, list.length), String(explained), String(open)];
});

// Every difference explained on its record.
const differenceRows = checks
  .filter((c) => c.explained)
  .map((c) => [c.table, c.subject, String(c.ours), String(Number(c.ref.toFixed(3))), c.reference, String(Number(c.tolerance.toFixed(3)))]);

// Reference copies.
const copyRows = readdirSync(join(root, 'tests', 'reference'))
  .filter((file) => Object.keys(refs).includes(file.replace(/\.json$/, '')))
  .map((file) => {
    const ref = refs[file.replace(/\.json$/, '')]!;
    return [file, ref.package, ref.version, ref.licence, ref.file, String(ref.records.length)];
  });

const table = (head: string[], rows: string[][]) =>
  [`| ${head.join(' | ')} |`, `| ${head.map(() => '---').join(' | ')} |`, ...rows.map((r) => `| ${r.join(' | ')} |`)].join('\n');

const tablesMd = table(['table', 'records', 'checked against a copy', 'by copy', 'from memory', 'neither (sourced, not compared)'], tableRows);
const familiesMd = table(['family', 'table', 'reference', 'compared', 'agree', 'agreement', 'differ, reason on the record', 'unresolved'], familyRows);
const differencesMd = table(['table', 'record', 'ours', 'copy', 'copy file', 'tolerance'], differenceRows);
const nestedMd = table(['table', 'quantity', 'records', 'checked against a copy', 'from memory'], nestedRows);
const unreachableRows = tableRows
  .filter((row) => row[0] !== '**all tables**' && Number(row[4]) > 0)
  .map((row) => [row[0]!, row[4]!, UNREACHABLE[row[0]!] ?? '(no reason recorded: add one to src/node/scripts/reference/unreachable.ts)']);
const unreachableMd = table(['table', 'from memory', 'why no reachable copy checks them'], unreachableRows);
const copiesMd = table(['file', 'package', 'version', 'licence', 'file inside the package', 'entries'], copyRows);

const report = `# Provenance of the data tables

Written by \`npm run provenance\` (src/node/scripts/provenance.ts); do not edit by hand. How the copies are made and how a record gets checked: [DEVELOPERS.md](../DEVELOPERS.md#checking-data-against-open-copies).

## Records per table

A record is *checked* when its value was matched against an open copy of a reference (its \`checkedAgainst\` names the copy under tests/reference/, and \`fromMemory\` is false); *from memory* when it was typed without a copy of its source at hand.

${tablesMd}

The *by copy* column names the copy (or copies) and, in parentheses, what was compared where it is not simply the copy's own number for the record: a cycle or closure built from the copies' numbers, a density, a composition.

### Quantities inside records

Some records hold several quantities, each with its own source and provenance; the counts above are of whole records (whose own \`fromMemory\` stays true while any part is from memory).

${nestedMd}

## What no reachable copy can check

Reachable here means the npm and Debian package registries, the Python packages already installed (PyPI itself does not answer from this machine), the PHREEQC databases under ../shared/reference/phreeqc/, and the public repositories and pages held by the project's search tool. Written from src/node/scripts/reference/unreachable.ts.

${unreachableMd}

## Agreement per comparison family

Each family compares one quantity of one table with one copy at a tolerance justified in src/node/scripts/reference/crossCheck.ts. *Agree* counts records within that tolerance; the others differ for a reason written on the record (\`differs from <reference>: …\`), most often a different evaluation of the same quantity (NBS 1982 here, CODATA or JANAF in the copy).

${familiesMd}

## Differences explained on their records

Each of these records says in its note why its value differs from the copy (search the note for \`differs from\`).

${differencesMd}

## Reference copies

${copiesMd}
`;

writeFileSync(join(root, 'docs', 'provenance.md'), report);
console.log(tablesMd);
console.log();
console.log(familiesMd);
console.log(`\nwritten to docs/provenance.md: ${checkedTotal} of ${total} records checked (${percent(checkedTotal, total)}), ${memoryTotal} from memory`);
