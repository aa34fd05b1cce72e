/** The backup carries the device's settings and depth-correction switches; they come back only when asked, checked. */
import { describe, expect, it } from 'vitest';
import { createBackup, parseBackup, backupToJson } from '../../src/jobs/backup';
import { calibrations, chosenFurnace } from '../../src/app/settings/calibration';
import { applyDeviceState, currentDeviceState } from '../../src/app/settings/deviceState';
import { DEFAULT_SETTINGS, settings } from '../../src/app/settings/state';

describe('device state in the backup', () => {
  it('goes out with the jobs and comes back whole from the file', () => {
    const before = settings.value;
    settings.value = { ...DEFAULT_SETTINGS, unitSystem: 'us', theme: 'contrast' };
    chosenFurnace.value = 'F2';
    const text = backupToJson(
      createBackup([], '0.1.0', new Date('2026-01-05T08:00:00Z'), undefined, currentDeviceState()),
    );
    const read = parseBackup(text);
    expect(read.ok).toBe(true);
    expect(read.ok && read.value.device).toMatchObject({
      settings: { unitSystem: 'us', theme: 'contrast' },
      furnace: 'F2',
    });
    settings.value = before;
    chosenFurnace.value = '';
  });
  it('is applied part by part against this version’s shapes: a wrong value falls back, an unknown one is dropped', () => {
    const before = { settings: settings.value, calibrations: calibrations.value };
    applyDeviceState({
      settings: { unitSystem: 'us', theme: 42, somethingNew: true, beta: { text: '2,5', unit: '' } },
      calibrations: [{ furnace: 'F1', nonsense: true }],
      furnace: 'F3',
    });
    expect(settings.value.unitSystem).toBe('us');
    expect(settings.value.theme).toBe(DEFAULT_SETTINGS.theme);
    expect(settings.value.beta).toEqual({ text: '2,5', unit: '' });
    expect('somethingNew' in settings.value).toBe(false);
    expect(calibrations.value).toEqual([]); // an entry that is no calibration is refused
    expect(chosenFurnace.value).toBe('F3');
    settings.value = before.settings;
    calibrations.value = before.calibrations;
    chosenFurnace.value = '';
  });
  it('a file without device state changes nothing on import', () => {
    const read = parseBackup(backupToJson(createBackup([], '0.1.0')));
    expect(read.ok && read.value.device).toBeUndefined();
  });
});
