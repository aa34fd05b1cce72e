/**
 * The server's rules, run here from the very text the set-up script loads into the server
 * (`VALIDATE_DOC_UPDATE`), on the cases the shop needs. The browser test runs them on a real
 * CouchDB-compatible server too.
 */
import { describe, expect, it } from 'vitest';
import { REFUSAL_CODES, VALIDATE_DOC_UPDATE } from '../../src/jobs/designDoc';

type Validate = (newDoc: unknown, oldDoc: unknown, userCtx: { name: string | null; roles: string[] }) => void;
// The function is data for the server; here it is turned back into a function to be called.
// eslint-disable-next-line @typescript-eslint/no-implied-eval -- the server's own code, evaluated as the server does
const makeValidate = new Function(`return (${VALIDATE_DOC_UPDATE});`) as () => Validate;
const validate = makeValidate();

const user = (name: string | null, ...roles: string[]) => ({ name, roles });
const job = (status: string, changedBy = 'mk', extra: Record<string, unknown> = {}) => ({
  _id: 'j1',
  type: 'job',
  job: { id: 'j1', status },
  versions: {},
  changedBy,
  ...extra,
});

/** The refusal code thrown, or 'allowed'. */
function outcome(newDoc: unknown, oldDoc: unknown, ctx: ReturnType<typeof user>): string {
  try {
    validate(newDoc, oldDoc, ctx);
    return 'allowed';
  } catch (error) {
    const thrown = error as { forbidden?: string; unauthorized?: string };
    return thrown.forbidden ?? thrown.unauthorized ?? 'threw something else';
  }
}

describe('validate_doc_update', () => {
  it('a signed-in operator logs and edits a load; a stranger or a signed-out writer cannot', () => {
    expect(outcome(job('planned'), null, user('mk', 'operator'))).toBe('allowed');
    expect(outcome(job('done'), job('inFurnace'), user('mk', 'operator'))).toBe('allowed');
    expect(outcome(job('planned', 'xy'), null, user('xy'))).toBe('noRole');
    expect(outcome(job('planned', ''), null, user(null))).toBe('signedOut');
  });

  it('"changed by" must be the server user writing, never another name', () => {
    expect(outcome(job('planned', 'sv'), null, user('mk', 'operator'))).toBe('changedByNotYou');
    expect(outcome({ ...job('planned'), changedBy: undefined }, null, user('mk', 'operator'))).toBe('changedByNotYou');
  });

  it('only a supervisor puts a load on hold or rejects it, or takes it off hold', () => {
    for (const status of ['onHold', 'rejected']) {
      expect(outcome(job(status), job('done'), user('mk', 'operator'))).toBe('supervisorOnly');
      expect(outcome(job(status, 'ql'), job('done'), user('ql', 'lab'))).toBe('supervisorOnly');
      expect(outcome(job(status, 'en'), job('done'), user('en', 'engineer'))).toBe('supervisorOnly');
      expect(outcome(job(status, 'sv'), job('done'), user('sv', 'supervisor'))).toBe('allowed');
      expect(outcome(job('done'), job(status), user('mk', 'operator'))).toBe('supervisorOnly');
    }
    // A new job created straight on hold needs the supervisor too; an unchanged hold does not.
    expect(outcome(job('onHold'), null, user('mk', 'operator'))).toBe('supervisorOnly');
    expect(outcome(job('onHold', 'ql', { notes: 'x' }), job('onHold'), user('ql', 'lab'))).toBe('allowed');
  });

  it('nobody deletes a job; a merged branch may be closed; a void needs its reason', () => {
    expect(outcome({ _id: 'j1', _deleted: true, changedBy: 'sv' }, job('done'), user('sv', 'supervisor'))).toBe(
      'noDeletion',
    );
    expect(
      outcome({ _id: 'j1', _deleted: true, changedBy: 'mk', mergedInto: '3-abc' }, job('done'), user('mk', 'operator')),
    ).toBe('allowed');
    expect(outcome(job('done', 'mk', { void: { reason: '' } }), job('done'), user('mk', 'operator'))).toBe(
      'voidNeedsReason',
    );
    expect(outcome(job('done', 'mk', { void: { reason: 'Logged twice' } }), job('done'), user('mk', 'operator'))).toBe(
      'allowed',
    );
  });

  it('only an engineer writes part masters and depth corrections; unknown kinds are refused', () => {
    const master = { _id: 'pm:KR-2231', type: 'partMaster', changedBy: 'mk' };
    expect(outcome(master, null, user('mk', 'operator'))).toBe('engineerOnly');
    expect(outcome({ ...master, changedBy: 'en' }, null, user('en', 'engineer'))).toBe('allowed');
    expect(outcome({ _id: 'x', type: 'recipe', changedBy: 'en' }, null, user('en', 'engineer'))).toBe('unknownType');
  });

  it('a server admin may do anything (set-up, repairs)', () => {
    expect(outcome({ _id: 'j1', _deleted: true }, job('done'), user('admin', '_admin'))).toBe('allowed');
  });

  it('every code it throws is listed (the app has words for each)', () => {
    const thrown = [...VALIDATE_DOC_UPDATE.matchAll(/(?:forbidden|unauthorized): '(\w+)'/gu)].map((m) => m[1]);
    expect(new Set(thrown)).toEqual(new Set(REFUSAL_CODES));
  });
});
