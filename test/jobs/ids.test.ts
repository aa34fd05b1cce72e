import { describe, expect, it } from 'vitest';
import { newJobId, uuidFromBytes } from '../../src/jobs/ids';
import { JobSchema } from '../../src/jobs/schema';
import * as v from 'valibot';

const UUID_V4 = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/u;

describe('job ids without crypto.randomUUID (a plain-http LAN address)', () => {
  it('sets the version and variant bits of RFC 9562 and keeps the other 122 bits', () => {
    expect(uuidFromBytes(new Uint8Array(16).fill(0xff))).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
    expect(uuidFromBytes(new Uint8Array(16))).toBe('00000000-0000-4000-8000-000000000000');
  });
  it('falls back to getRandomValues when randomUUID is missing, giving ids the record accepts', () => {
    const ids = new Set<string>();
    for (let i = 0; i < 200; i++) {
      const id = newJobId({ getRandomValues: (array) => crypto.getRandomValues(array) });
      expect(id).toMatch(UUID_V4);
      ids.add(id);
    }
    expect(ids.size).toBe(200);
    const idField = JobSchema.entries.id;
    expect(v.is(idField, [...ids][0])).toBe(true);
  });
  it('uses randomUUID where the browser has it', () => {
    expect(
      newJobId({ randomUUID: () => '0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b', getRandomValues: () => new Uint8Array(16) }),
    ).toBe('0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b');
  });
});
