/**
 * Errors of the evaluation: each problem names the zone (when there is one) and the field,
 * so the service can return it as a 400 and the UI can put it beside the right input.
 */

export interface ParameterIssue {
  /** Zone name, or null for a well-level input (depth, curves, survey). */
  zone: string | null;
  /** Field path, e.g. 'rhoMatrix', 'rw.rw', 'temperature.bhtDepth', 'top', 'curves.rhob'. */
  field: string;
  /** What is wrong, starting with the field: 'rhoMatrix must differ from rhoFluid'. */
  message: string;
}

/** One line for an issue: "zone 'Upper Sand': rhoMatrix must differ from rhoFluid". */
export function formatIssue(issue: ParameterIssue): string {
  return issue.zone === null ? issue.message : `zone '${issue.zone}': ${issue.message}`;
}

/**
 * Thrown by evaluateWell (and the other evaluation entry points) when inputs are invalid.
 * A RangeError whose message is `fn: issue; issue; ...`, with the issues as data.
 */
export class EvaluationInputError extends RangeError {
  readonly issues: readonly ParameterIssue[];
  constructor(fn: string, issues: readonly ParameterIssue[]) {
    super(`${fn}: ${issues.map(formatIssue).join('; ')}`);
    this.name = 'EvaluationInputError';
    this.issues = issues;
  }
}

/** Throws EvaluationInputError when the list is not empty. */
export function throwIfIssues(fn: string, issues: readonly ParameterIssue[]): void {
  if (issues.length > 0) throw new EvaluationInputError(fn, issues);
}
