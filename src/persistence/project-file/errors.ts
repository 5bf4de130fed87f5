import type { z } from 'zod';

/** Why a file was refused. Each code has a plain-language message for the user. */
export type ProjectFileErrorCode =
  | 'too-large'
  | 'empty'
  | 'truncated'
  | 'not-json'
  | 'not-a-project-file'
  | 'newer-version'
  | 'invalid';

/** A project file that cannot be read. `message` says what is wrong in words a user can act on. */
export class ProjectFileError extends Error {
  readonly code: ProjectFileErrorCode;
  /** Field-level problems (path: message) for `invalid` files, at most 20. */
  readonly details: string[];
  constructor(code: ProjectFileErrorCode, message: string, details: string[] = []) {
    super(message);
    this.name = 'ProjectFileError';
    this.code = code;
    this.details = details;
  }
}

/** A `ProjectFileError` of code 'invalid' listing the first 20 field problems of a zod error. */
export function invalidFileError(error: z.ZodError, what = 'This project file'): ProjectFileError {
  const details = error.issues
    .slice(0, 20)
    .map((i) => `${i.path.length ? i.path.join('.') : '(file)'}: ${i.message}`);
  const more = error.issues.length > 20 ? ` (and ${error.issues.length - 20} more)` : '';
  return new ProjectFileError(
    'invalid',
    `${what} does not pass validation: ${details.slice(0, 3).join('; ')}${more}${details.length > 3 ? ' …' : ''}`,
    details,
  );
}
