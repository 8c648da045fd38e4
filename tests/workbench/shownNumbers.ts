// Checks the numbers a workbench panel shows against the library's own result: each number carries the path of the
// result field it shows (`best.value`, `result.dissolved.0.dissolvedMass`, `course.extreme.timeS/60`), and must equal
// that field to the precision it is written with (half a unit of its last digit; trailing zeros of a whole number
// count as rounding, as the library rounds by the uncertainty).

export interface Shown {
  text: string;
  path: string;
  magnitude?: boolean;
}

/** The number at `path` in `result`; a trailing `/60` divides (seconds shown as minutes). */
export function valueAt(result: unknown, path: string): number | undefined {
  const [fieldPath, divisor] = path.split('/');
  let v: unknown = result;
  for (const key of fieldPath!.split('.')) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  if (typeof v !== 'number') return undefined;
  return divisor ? v / Number(divisor) : v;
}

/** The text as a number: true minus signs and a leading + read. */
export function shownValue(text: string): number {
  return Number(text.trim().replace('−', '-').replace(/^\+/, ''));
}

/** Every shown number that does not match its field, as `path: shown 1.23, library 1.25`. */
export function mismatches(shown: readonly Shown[], result: unknown): string[] {
  const out: string[] = [];
  for (const s of shown) {
    const library = valueAt(result, s.path);
    const x = shownValue(s.text);
    if (library === undefined || !Number.isFinite(x)) {
      out.push(`${s.path}: shown "${s.text}", library ${String(library)}`);
      continue;
    }
    // The place of the last digit: a decimal, or for a whole number rounded by its uncertainty (190 s) its trailing zeros.
    const decimals = s.text.includes('.') ? s.text.split('.')[1]!.length : -(/[1-9](0*)$/.exec(s.text)?.[1]?.length ?? 0);
    const expected = s.magnitude ? Math.abs(library) : library;
    // Half a unit of the last digit shown, and a hair for binary rounding of the library's own value.
    const tolerance = 0.5 * 10 ** -decimals * (1 + 1e-9) + 1e-12;
    if (Math.abs(x - expected) > tolerance) out.push(`${s.path}: shown ${s.text}, library ${expected}`);
  }
  return out;
}
