/** The error function erf(x), from stdlib-js (tested there against published tables; here against A&S Table 7.1). */
import erfImpl from '@stdlib/math-base-special-erf';

export const erf: (x: number) => number = erfImpl;
