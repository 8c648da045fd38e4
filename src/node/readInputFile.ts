/**
 * Opening a user's input file safely: only a regular file is read (a FIFO
 * with no writer would block forever, `/dev/zero` would never end), the
 * check is made on the opened file itself (no race between a check and the
 * open), opening never blocks, and whole-file reads are bounded in size.
 *
 * @module
 */
import { closeSync, constants, fstatSync, openSync, readSync, type Stats } from 'node:fs';
import { IonheatError } from '../error.js';

/** What a path names when it is not a regular file, in words. */
function kindOf(stat: Stats): string {
  if (stat.isDirectory()) return 'a directory';
  if (stat.isFIFO()) return 'a named pipe (FIFO)';
  if (stat.isCharacterDevice() || stat.isBlockDevice()) return 'a device';
  if (stat.isSocket()) return 'a socket';
  return 'not a regular file';
}

/** An error code of the file system in words, for messages. */
export function fileErrorText(e: unknown): string {
  const code = (e as NodeJS.ErrnoException).code;
  if (code === 'ENOENT') return 'ENOENT (no such file)';
  if (code === 'EACCES' || code === 'EPERM') return `${code} (no permission to read it)`;
  if (code === 'ENOTDIR') return 'ENOTDIR (a folder on its path is a file)';
  return code ?? (e instanceof Error ? e.message : String(e));
}

/** An open regular file: its descriptor (the caller closes it), size, device and inode. */
export interface OpenedFile {
  fd: number;
  size: number;
  dev: number;
  ino: number;
}

/**
 * Opens a regular file for reading without blocking, or refuses it.
 *
 * @param path - the full path
 * @param role - what the file is for, in words (`the candidate file`, `data file`), for messages
 * @param shownAs - the name as the user gave it, for messages
 * @param hint - said after the refusal of something that is not a regular file
 * @throws IonheatError `INVALID_ARGUMENT` naming the file and what it is
 */
export function openRegularFile(path: string, role: string, shownAs: string, hint = ''): OpenedFile {
  let fd: number;
  try {
    // O_NONBLOCK: opening a FIFO with no writer returns at once instead of waiting for one.
    fd = openSync(path, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'EISDIR') throw new IonheatError('INVALID_ARGUMENT', `cannot read ${role} "${shownAs}": it is a directory`, { field: shownAs });
    throw new IonheatError('INVALID_ARGUMENT', `cannot read ${role} "${shownAs}": ${fileErrorText(e)}`, { field: shownAs });
  }
  const stat = fstatSync(fd);
  if (!stat.isFile()) {
    closeSync(fd);
    throw new IonheatError('INVALID_ARGUMENT', `cannot read ${role} "${shownAs}": it is ${kindOf(stat)}, not a file${hint}`, { field: shownAs });
  }
  return { fd, size: stat.size, dev: stat.dev, ino: stat.ino };
}

/**
 * Reads a whole regular file as UTF-8 text (a leading byte-order mark
 * dropped), refusing it when it is larger than `maxBytes`.
 *
 * @param path - the full path
 * @param role - what the file is for, in words, for messages
 * @param shownAs - the name as the user gave it, for messages
 * @param maxBytes - the largest file accepted
 * @throws IonheatError `INVALID_ARGUMENT` for a file that cannot be read, is not a regular file, or is too large
 */
export function readTextFile(path: string, role: string, shownAs: string, maxBytes: number): string {
  const file = openRegularFile(path, role, shownAs);
  try {
    const tooLarge = () => new IonheatError('INVALID_ARGUMENT', `cannot read ${role} "${shownAs}": it is larger than ${megabytes(maxBytes)}, the most read whole`, { field: shownAs });
    if (file.size > maxBytes) throw tooLarge();
    // Read to the end, not to the size seen at the open: the file may grow; stop one byte past the bound.
    const chunks: Buffer[] = [];
    let total = 0;
    for (;;) {
      const chunk = Buffer.allocUnsafe(Math.min(1 << 20, maxBytes + 1 - total));
      let n: number;
      try {
        n = readSync(file.fd, chunk, 0, chunk.length, null);
      } catch (e) {
        throw new IonheatError('INVALID_ARGUMENT', `cannot read ${role} "${shownAs}": ${fileErrorText(e)}`, { field: shownAs });
      }
      if (n === 0) break;
      chunks.push(chunk.subarray(0, n));
      total += n;
      if (total > maxBytes) throw tooLarge();
    }
    return withoutBom(Buffer.concat(chunks, total).toString('utf8'));
  } finally {
    closeSync(file.fd);
  }
}

/** Text without a leading byte-order mark (editors on some systems write one; it is not part of the content). */
export function withoutBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/** A byte count in MB (2^20 bytes), for messages. */
export function megabytes(bytes: number): string {
  return `${(bytes / 2 ** 20).toLocaleString('en-US', { maximumFractionDigits: 1 })} MB`;
}
