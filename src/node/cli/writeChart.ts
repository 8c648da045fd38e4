import { writeFileSync } from 'node:fs';
import { isAbsolute, join } from 'node:path';
import { IonheatError } from '../../error.js';

/**
 * Writes a chart to `file` (relative to `cwd`) and returns the full path; a
 * file that cannot be written is an `INVALID_ARGUMENT` error naming the option.
 */
export function writeChart(cwd: string, file: string, svg: string, option: string): string {
  const path = isAbsolute(file) ? file : join(cwd, file);
  try {
    writeFileSync(path, svg);
  } catch (e) {
    throw new IonheatError('INVALID_ARGUMENT', `--${option}: cannot write "${file}": ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`, { field: option });
  }
  return path;
}
