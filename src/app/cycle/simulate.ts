/** The cycle screen's one link to the cycle solver (kept apart so tests and screens share it). */
export { simulateCycle as simulate } from '../../physics/cycle/simulate';
