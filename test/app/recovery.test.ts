import { describe, expect, it } from 'vitest';
import { computeRecovery } from '../../src/app/recovery/results';
import { addReading, DEFAULT_RECOVERY_FORM, removeReading, setReading } from '../../src/app/recovery/state';
import { field } from '../../src/app/ui/fieldText';
import { equivalentTime } from '../../src/physics';

describe('upset recovery', () => {
  it('"the furnace sat 40 min at 890 °C: how much longer at 925 °C?" matches equivalentTime', () => {
    const out = computeRecovery(DEFAULT_RECOVERY_FORM, 'agren');
    const expected = equivalentTime({
      history: [
        { timeH: 0, temperatureC: 890 },
        { timeH: 40 / 60, temperatureC: 890 },
      ],
      setTemperatureC: 925,
      requiredTimeH: 4,
      model: 'agren',
    });
    expect(expected.ok).toBe(true);
    if (!expected.ok || !out.result) throw new Error('no result');
    expect(out.result.equivalentTimeH).toBeCloseTo(expected.value.equivalentTimeH, 12);
    // Running 35 °C cool, 40 minutes are worth less than 40 minutes at the set temperature.
    expect(out.result.equivalentTimeH).toBeLessThan(40 / 60);
    expect(out.result.extraTimeH).toBeCloseTo(4 - out.result.equivalentTimeH, 12);
  });

  it('places errors on the reading that caused them', () => {
    const late = setReading(DEFAULT_RECOVERY_FORM, 1, { time: field('-5', 'min') });
    expect(computeRecovery(late, 'agren').errors['history.1.timeH']?.code).toBe('history.notIncreasing');
    const bad = setReading(DEFAULT_RECOVERY_FORM, 0, { temperature: field('abc', 'C') });
    expect(computeRecovery(bad, 'agren').errors['history.0.temperatureC']?.code).toBe('number.invalid');
  });

  it('one reading is not a history: a general error', () => {
    const single = removeReading(DEFAULT_RECOVERY_FORM, 1);
    const out = computeRecovery(single, 'agren');
    expect(out.result).toBeUndefined();
    expect(out.general?.code).toBe('history.tooShort');
  });

  it('adding a reading copies the last temperature and leaves the time to fill in', () => {
    const more = addReading(DEFAULT_RECOVERY_FORM);
    expect(more.readings).toHaveLength(3);
    expect(more.readings[2]?.temperature.text).toBe('890');
    expect(more.readings[2]?.time.text).toBe('');
  });
});
