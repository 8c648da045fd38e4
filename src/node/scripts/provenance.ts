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
    const copy = (r.checkedAgainst as string).replace(/ \(.*\)$/, '').replaceAll('tests/reference/', '').replaceAll('.json', '');
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
const copiesMd = table(['file', 'package', 'version', 'licence', 'file inside the package', 'entries'], copyRows);

const report = `# Provenance of the data tables

Written by \`npm run provenance\` (src/node/scripts/provenance.ts); do not edit by hand. How the copies are made and how a record gets checked: [DEVELOPERS.md](../DEVELOPERS.md#checking-data-against-open-copies).

## Records per table

A record is *checked* when its value was matched against an open copy of a reference (its \`checkedAgainst\` names the copy under tests/reference/, and \`fromMemory\` is false); *from memory* when it was typed without a copy of its source at hand.

${tablesMd}

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
