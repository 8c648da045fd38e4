/**
 * Marks every record that agrees with its open reference copy (or whose note
 * explains the difference): `fromMemory: false` and `checkedAgainst` naming the
 * copy. Prints the disagreements still to be resolved, by fixing the value or by
 * a note `differs from <reference>: why`. Run by hand after extracting references
 * or changing data: `npx tsx src/node/scripts/reference/markChecked.ts`.
 *
 * @module
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { FAMILIES, checkedAgainstText, checkedObject, crossChecks, loadInputs } from './crossCheck.js';
import { editRecords, type RecordEdit } from './jsonRecordEdit.js';

const root = join(import.meta.dirname, '..', '..', '..', '..');
const { tables, refs } = loadInputs(root);
const checks = crossChecks(tables, refs);
const edits = new Map<string, RecordEdit[]>();
const open: string[] = [];
for (const check of checks) {
  if (!check.agree && !check.explained) {
    open.push(`${check.table} ${check.subject}: ours ${check.ours}, ${check.reference} ${check.ref} (tolerance ${check.tolerance.toFixed(3)}) ${check.refLabel}`);
    continue;
  }
  const record = checkedObject(tables, check);
  const text = checkedAgainstText(FAMILIES[check.family]!);
  if (record.checkedAgainst === text && record.fromMemory === false) continue;
  const list = edits.get(check.table) ?? [];
  list.push({ index: check.index, set: { fromMemory: false, checkedAgainst: text }, after: { checkedAgainst: 'fromMemory' }, ...(check.field ? { field: check.field } : {}) });
  edits.set(check.table, list);
}
for (const [table, list] of edits) {
  const file = join(root, 'data', table);
  writeFileSync(file, editRecords(readFileSync(file, 'utf8'), list));
  console.log(`${table}: ${list.length} records marked`);
}
if (open.length > 0) {
  console.log(`\n${open.length} disagreements to resolve:`);
  for (const line of open) console.log(`  ${line}`);
}
