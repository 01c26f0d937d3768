/**
 * Errors the thermal engine throws for input it cannot compute.
 *
 * `ThermalInputError` means the request is well-formed but physically impossible or outside the
 * data the engine has (a target colder than the coolant, water above boiling at its pressure, a
 * fluid outside its tabulated range). The server maps it to HTTP 422; the message is written for
 * the engineer who typed the duty, and `field` names the offending input where there is one
 * (dotted path as in the request body, e.g. `process.inletTemp_C`).
 */
export class ThermalInputError extends Error {
  readonly code: string;
  readonly field?: string;

  constructor(code: string, message: string, field?: string) {
    super(message);
    this.name = 'ThermalInputError';
    this.code = code;
    this.field = field;
  }
}

/** A result-level caution: the answer is computed but the engineer should know this. */
export interface ThermalWarning {
  code: string;
  message: string;
}
