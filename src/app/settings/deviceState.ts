/**
 * What a device keeps besides the log (settings, depth corrections with their on/off switches, the
 * chosen furnace) goes into the backup file, and comes back from it only when a person asks: an
 * import into another device must not change its units or language unasked.
 */
import { isLanguage } from '../../i18n/i18n';
import { language, switchLanguage } from '../../i18n/useT';
import type { DeviceState } from '../../jobs';
import { mergeDefaults } from '../ui/persist';
import { calibrations, chosenFurnace, readCalibrations } from './calibration';
import { DEFAULT_SETTINGS, settings } from './state';

export function currentDeviceState(): DeviceState {
  return { settings: settings.value, calibrations: calibrations.value, furnace: chosenFurnace.value };
}

/** Each part checked against its own shape, as when it is read from this device's storage. */
export function applyDeviceState(device: DeviceState): void {
  if ('settings' in device) {
    const next = mergeDefaults(DEFAULT_SETTINGS, device.settings);
    settings.value = next;
    if (isLanguage(next.language) && next.language !== language.value) void switchLanguage(next.language);
  }
  if ('calibrations' in device) calibrations.value = readCalibrations(device.calibrations);
  if (typeof device.furnace === 'string') chosenFurnace.value = device.furnace;
}
