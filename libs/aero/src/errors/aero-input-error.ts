/**
 * Why an aerodynamic function refused its input.
 * - `NOT_FINITE`: NaN or ±Infinity where a number was needed.
 * - `OUT_OF_RANGE`: a finite value that is physically impossible or outside the formula's validity.
 * - `ZERO_WIND`: no flow (zero or negative dynamic pressure or speed) where the quantity needs wind.
 * - `EMPTY_INPUT`: a list that needs values was empty or too short.
 * - `NOT_COVERED`: measured data do not span the range the calculation needs.
 * - `UNKNOWN_ID`: a name that is not in the catalogue.
 */
export type AeroInputErrorCode = 'NOT_FINITE' | 'OUT_OF_RANGE' | 'ZERO_WIND' | 'EMPTY_INPUT' | 'NOT_COVERED' | 'UNKNOWN_ID';

/**
 * Bad input to a function of the reduction engine. The message names the function, the input, the value
 * and its unit, e.g. "`speedFromDynamicPressure` requires a positive dynamic pressure; got 0 Pa (is the wind on?)".
 *
 * @example
 * try { speedFromDynamicPressure(0, 1.2); } catch (e) { if (e instanceof AeroInputError) e.code; } // 'ZERO_WIND'
 */
export class AeroInputError extends Error {
  /** Machine-readable reason, for callers that turn the error into a warning or an HTTP 400. */
  readonly code: AeroInputErrorCode;

  /**
   * @param code - why the input was refused
   * @param message - what was wrong and where, naming the function
   */
  constructor(code: AeroInputErrorCode, message: string) {
    super(message);
    this.name = 'AeroInputError';
    this.code = code;
  }
}
