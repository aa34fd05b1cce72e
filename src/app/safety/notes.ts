/** The safety notes shown on the safety screen, as translation keys (each ends by deferring to codes and people). */
export const SAFETY_NOTES = ['atmosphere', 'purge', 'quench', 'estimates'] as const;
