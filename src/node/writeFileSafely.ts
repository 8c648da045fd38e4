/**
 * Writing an output file so that nothing is lost: never over an input of
 * the same run, never over something that is not a regular file, and
 * through a temporary file renamed into place, so that a failure (a full
 * disk) leaves the old file as it was instead of an empty or half-written one.
 *
 * @module
 */
import { closeSync, fstatSync, fsyncSync, openSync, renameSync, statSync, unlinkSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { IonheatError } from '../error.js';
import { fileErrorText } from './readInputFile.js';

/** A file's identity: two paths name the same file when these agree. */
export interface FileIdentity {
  dev: number;
  ino: number;
}

/** The identity of an existing file, or undefined when there is none at `path`. */
export function fileIdentity(path: string): FileIdentity | undefined {
  try {
    const s = statSync(path);
    return { dev: s.dev, ino: s.ino };
  } catch {
    return undefined;
  }
}

/**
 * Refuses an output path that names one of the run's inputs (compared by
 * device and inode, so other spellings and links of the same file are
 * caught) or something other than a regular file.
 *
 * @param target - the full output path
 * @param option - the option that named it, for messages (`--svg`)
 * @param inputs - the identities of the run's input files
 * @throws IonheatError `INVALID_ARGUMENT` saying which
 */
export function checkOutputTarget(target: string, option: string, inputs: readonly (FileIdentity | undefined)[]): void {
  let stat;
  try {
    stat = statSync(target);
  } catch {
    return; // nothing there yet: nothing to overwrite
  }
  if (inputs.some((i) => i !== undefined && i.dev === stat.dev && i.ino === stat.ino)) {
    throw new IonheatError('INVALID_ARGUMENT', `${option} names an input of this run ("${target}"); writing there would destroy it: choose another file`, { field: option.replace(/^--/, '') });
  }
  if (!stat.isFile()) {
    throw new IonheatError('INVALID_ARGUMENT', `${option} "${target}" is ${stat.isDirectory() ? 'a directory' : 'not a regular file'}; give the name of a file to write`, { field: option.replace(/^--/, '') });
  }
}

/**
 * Writes `text` to `target` through a temporary file in the same folder,
 * flushed to disk and then renamed over the target (an atomic replacement
 * on POSIX file systems).
 *
 * @param target - the full output path
 * @param text - the content
 * @param what - what the file holds, for messages (`the chart`)
 * @param option - the option that named the file (`--svg`)
 * @throws IonheatError `INVALID_ARGUMENT` when the file cannot be written; the old file, if any, is left unchanged
 */
export function writeFileSafely(target: string, text: string, what: string, option: string): void {
  const full = resolve(target);
  const temp = join(dirname(full), `.${basename(full)}.${process.pid}.${Date.now().toString(36)}.tmp`);
  let fd: number | undefined;
  try {
    fd = openSync(temp, 'wx', 0o644);
    const bytes = Buffer.from(text, 'utf8');
    let at = 0;
    while (at < bytes.length) at += writeSync(fd, bytes, at, bytes.length - at);
    fsyncSync(fd);
    if (!fstatSync(fd).isFile()) throw Object.assign(new Error('not a regular file'), { code: 'EINVAL' });
    closeSync(fd);
    fd = undefined;
    renameSync(temp, full);
  } catch (e) {
    if (fd !== undefined) closeSync(fd);
    try {
      unlinkSync(temp);
    } catch {
      // the temporary file was never made, or is gone already
    }
    throw new IonheatError('INVALID_ARGUMENT', `cannot write ${what} to "${target}" (${option}): ${fileErrorText(e)}; the file there before, if any, is unchanged`, { field: option.replace(/^--/, '') });
  }
}
