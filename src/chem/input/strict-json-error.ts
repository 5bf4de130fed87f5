import { ChemInputError } from '../result';

export type StrictJsonProblem =
  'too-large' | 'utf8' | 'syntax' | 'too-deep' | 'duplicate-key' | 'forbidden-key';

/** A refusal by the JSON reader: `field` is the key path where it happened (or the caller's field). */
export class StrictJsonError extends ChemInputError {
  readonly problem: StrictJsonProblem;
  /** Key path inside the document (`customIons.0.id`), empty for the whole document. */
  readonly path: string;
  constructor(
    problem: StrictJsonProblem,
    field: string,
    path: string,
    message: string,
    accepted: string,
  ) {
    super(field, message, accepted);
    this.name = 'StrictJsonError';
    this.problem = problem;
    this.path = path;
  }
}
