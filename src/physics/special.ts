/**
 * Special functions used by the closed-form solutions. They come from stdlib-js
 * (tested there against published tables); this module only gives them one home.
 */
import erfImpl from '@stdlib/math-base-special-erf';
import erfcImpl from '@stdlib/math-base-special-erfc';
import erfcinvImpl from '@stdlib/math-base-special-erfcinv';
import erfcxImpl from '@stdlib/math-base-special-erfcx';

/** Error function erf(x). */
export const erf: (x: number) => number = erfImpl;
/** Complementary error function erfc(x) = 1 − erf(x). */
export const erfc: (x: number) => number = erfcImpl;
/** Inverse of erfc on (0, 2). */
export const erfcinv: (y: number) => number = erfcinvImpl;
/** Scaled complementary error function erfcx(x) = exp(x²)·erfc(x); finite where erfc underflows. */
export const erfcx: (x: number) => number = erfcxImpl;
