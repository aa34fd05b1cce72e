/**
 * Which unit each quantity is shown and typed in: the unit system's choice, or a
 * per-quantity override from the settings. Physics always receives °C, mm and h.
 */

export const UNIT_SYSTEMS = ['metric', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const UNIT_CHOICES = {
  temperature: ['C', 'F'],
  depth: ['mm', 'in'],
  time: ['h', 'min'],
} as const;

export type DisplayQuantity = keyof typeof UNIT_CHOICES;

export interface DisplayUnits {
  temperature: (typeof UNIT_CHOICES.temperature)[number];
  depth: (typeof UNIT_CHOICES.depth)[number];
  time: (typeof UNIT_CHOICES.time)[number];
}

/** The units physics works in at its request boundary. */
export const PHYSICS_UNITS: DisplayUnits = { temperature: 'C', depth: 'mm', time: 'h' };

const SYSTEM_UNITS: Record<UnitSystem, DisplayUnits> = {
  metric: { temperature: 'C', depth: 'mm', time: 'h' },
  us: { temperature: 'F', depth: 'in', time: 'h' },
};

/** 'auto' follows the unit system. */
export type UnitOverrides = { [Q in DisplayQuantity]: 'auto' | DisplayUnits[Q] };

export function displayUnits(system: UnitSystem, overrides: UnitOverrides): DisplayUnits {
  const base = SYSTEM_UNITS[system];
  return {
    temperature: overrides.temperature === 'auto' ? base.temperature : overrides.temperature,
    depth: overrides.depth === 'auto' ? base.depth : overrides.depth,
    time: overrides.time === 'auto' ? base.time : overrides.time,
  };
}
