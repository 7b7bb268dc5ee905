/**
 * What went wrong, as a stable code the API can map to a status and the web can switch on.
 * - `invalid-input`: a value is missing, not a number, negative where it may not be, and so on.
 * - `invalid-polygon`: an area's corners do not make a simple polygon with an area.
 * - `too-cold`: the air is below the minimum laying temperature, so no catalyst dose is given.
 * - `not-allowed`: the rule forbids it (LIFO valuation, issuing more than is held).
 * - `negative-balance`: a stock ledger would go below zero.
 */
export type DomainErrorCode = 'invalid-input' | 'invalid-polygon' | 'too-cold' | 'not-allowed' | 'negative-balance';

/** The one error @potlife/domain throws: a sentence a person can act on, and a code. */
export class DomainError extends Error {
  readonly code: DomainErrorCode;

  constructor(message: string, code: DomainErrorCode = 'invalid-input') {
    super(message);
    this.name = 'DomainError';
    this.code = code;
  }
}

/** For the `default` branch of an exhaustive switch: reached only by a value from outside the types. */
export function unexpected(what: string, value: never): never {
  throw new DomainError(`Unknown ${what}: ${JSON.stringify(value)}.`);
}
