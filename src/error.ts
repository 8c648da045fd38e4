/**
 * The one error class ionheat throws. Every failure a caller can cause (a bad
 * formula, a missing table value, an out-of-range argument) becomes an
 * `IonheatError` with a stable `code`, so that software can branch on the code
 * and people can read the message.
 *
 * @module
 */

/** Stable failure codes. Never renamed once published; new ones may be added. */
export const errorCodes = [
  'EMPTY_FORMULA',
  'FORMULA_TOO_LONG',
  'UNEXPECTED_CHARACTER',
  'UNMATCHED_PARENTHESIS',
  'NESTING_TOO_DEEP',
  'BAD_COUNT',
  'UNKNOWN_ELEMENT',
  'UNKNOWN_ION',
  'UNBALANCED_CHARGE',
  'AMBIGUOUS_FORMULA',
  'MISSING_DATA',
  'NOT_APPLICABLE',
  'INVALID_ARGUMENT',
  'INVALID_OPTION',
  'INVALID_DATA',
  'INVALID_EXPRESSION',
  'NO_SOLUTION',
  'SUSPECTED_TYPO',
] as const;

export type ErrorCode = (typeof errorCodes)[number];

/** Where in the user's text a problem was found. */
export interface ErrorContext {
  /** The offending text (the whole formula, or the field's value). */
  text?: string;
  /** Zero-based character position in `text`, where it makes sense (messages count from 1, as people do). */
  position?: number;
  /** A field, file, record or argument name the problem belongs to. */
  field?: string;
}

/**
 * A failure with a stable `code` and a message in a chemist's words.
 *
 * @param code - one of {@link errorCodes}; stable, so software can branch on it
 * @param message - what was wrong, naming the field, file, record or position
 * @param context - the offending text, a zero-based character position in it, and the field it belongs to
 * @see DEVELOPERS.md, "Conventions", on errors: only this class is thrown for anything a caller can cause.
 *
 * @example
 * ```ts
 * const e = new IonheatError('UNKNOWN_ION', 'no ion in the table matches "Xy"', { text: 'XyCl', position: 0 });
 * e.code; // 'UNKNOWN_ION'
 * e.toJSON().position; // 0
 * ```
 */
export class IonheatError extends Error {
  override readonly name = 'IonheatError';
  readonly code: ErrorCode;
  readonly text: string | undefined;
  readonly position: number | undefined;
  readonly field: string | undefined;

  constructor(code: ErrorCode, message: string, context: ErrorContext = {}) {
    super(message);
    this.code = code;
    this.text = context.text;
    this.position = context.position;
    this.field = context.field;
  }

  /** A plain object for JSON output. */
  toJSON(): { code: ErrorCode; message: string; text?: string; position?: number; field?: string } {
    return {
      code: this.code,
      message: this.message,
      ...(this.text !== undefined ? { text: this.text } : {}),
      ...(this.position !== undefined ? { position: this.position } : {}),
      ...(this.field !== undefined ? { field: this.field } : {}),
    };
  }
}

/**
 * True when `e` is an {@link IonheatError}, whatever realm it came from (an
 * error thrown by another copy of the library, or one that crossed a worker
 * boundary, is recognised by its `name` and `code`).
 *
 * @param e - anything caught
 * @see DEVELOPERS.md, "Conventions", on errors.
 *
 * @example
 * ```ts
 * let caught;
 * try { parseSalt('NaXy'); } catch (e) { caught = e; }
 * isIonheatError(caught); // true
 * caught.code; // 'UNKNOWN_ELEMENT'
 * isIonheatError(new Error('other')); // false
 * ```
 */
export function isIonheatError(e: unknown): e is IonheatError {
  return e instanceof IonheatError || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'IonheatError' && typeof (e as { code?: unknown }).code === 'string');
}
