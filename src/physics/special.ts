/**
 * Special functions used by the closed-form solutions. They come from stdlib-js
 * (tested there against published tables); this module only gives them one home.
 */
import erfcImpl from '@stdlib/math-base-special-erfc';
import erfcinvImpl from '@stdlib/math-base-special-erfcinv';
import erfcxImpl from '@stdlib/math-base-special-erfcx';

/**
 * erf itself has its own module (`erf.ts`): the first screen loads this one, and a function bound
 * here is bundled with it once anything uses it; erf is used only off the first screen.
 */
export { erf } from './erf';
/** Complementary error function erfc(x) = 1 − erf(x). */
export const erfc: (x: number) => number = erfcImpl;
/** Inverse of erfc on (0, 2). */
export const erfcinv: (y: number) => number = erfcinvImpl;
/** Scaled complementary error function erfcx(x) = exp(x²)·erfc(x); finite where erfc underflows. */
export const erfcx: (x: number) => number = erfcxImpl;
