/** The shift hours from the settings, checked; the demo plant's hours while they are not valid. */
import { computed } from '@preact/signals';
import { DEFAULT_SHIFT_CONFIG, parseShiftConfig, shiftOf, type ShiftSlot } from '../../jobs';
import { settings } from '../settings/state';

export const shiftConfig = computed(() => {
  const parsed = parseShiftConfig(settings.value.shiftStarts);
  return parsed.ok ? parsed.value : DEFAULT_SHIFT_CONFIG;
});

/** The shift running now, by the settings' hours. */
export function currentShift(now: Date = new Date()): ShiftSlot {
  return shiftOf(now, shiftConfig.value);
}
