/**
 * What travels back over IPC or HTTP: either a value or an error the officer can act on.
 * Errors are plain data (Error objects do not survive structured clone with their fields).
 */
export type ApiErrorCode =
  | 'invalid_input' // the payload failed its schema; `issues` names each field
  | 'unknown_operation'
  | 'input_error' // the core refused a value (InputError): field, value and valid range
  | 'not_found'
  | 'conflict' // e.g. a signed record cannot be changed
  | 'stale' // someone else saved meanwhile: reload and compare (nothing was overwritten)
  | 'in-use' // the database is open for writing in another Beamwarden
  | 'storage' // the disk or folder refused: read-only, full, missing, immutable file
  | 'forbidden' // sender or token check failed
  | 'internal';

export interface ApiIssue {
  /** Dotted path of the field, e.g. "room.lasers.0.beams.1.wavelength_nm". */
  readonly path: string;
  readonly message: string;
}

export interface ApiErrorBody {
  readonly code: ApiErrorCode;
  readonly message: string;
  readonly field?: string;
  readonly issues?: readonly ApiIssue[];
}

export type Reply<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly error: ApiErrorBody };

/** Thrown by handlers for errors that are the caller's, not the program's. */
export class ApiFailure extends Error {
  override readonly name = 'ApiFailure';
  constructor(
    readonly code: ApiErrorCode,
    message: string,
    readonly field?: string,
  ) {
    super(message);
  }
}
