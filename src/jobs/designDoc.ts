/**
 * The rules the shop server enforces, as CouchDB's `validate_doc_update` design document. The
 * function is kept as plain ES5 text (CouchDB runs it in its own JavaScript engine, not ours), and
 * the same text is evaluated by the unit tests and loaded by the set-up script, so what is tested is
 * what the server runs. A refusal is thrown as `{forbidden: code}` (or `{unauthorized: code}`); the
 * codes are words under `jobs.server.` in every locale.
 *
 * - Every writer is a signed-in server user with one of the four roles (or a server admin).
 * - `changedBy` must name the server user writing (the server's own user, never the client's claim).
 * - Nobody deletes a job: a job is marked void with a reason; the only tombstones allowed are the
 *   branches closed when two devices' copies were merged (`mergedInto`).
 * - Only a supervisor moves a job to or from released, on hold or rejected.
 * - Only an engineer writes part masters and depth corrections.
 */
export const DESIGN_DOC_ID = '_design/casefront';

export const ROLES = ['operator', 'lab', 'supervisor', 'engineer'] as const;
export type Role = (typeof ROLES)[number];

/** Statuses only a supervisor sets or leaves. */
export const SUPERVISOR_STATUSES = ['onHold', 'rejected'] as const;

/** Document types only an engineer writes. */
export const ENGINEER_TYPES = ['partMaster', 'depthCorrection'] as const;

export const REFUSAL_CODES = [
  'signedOut',
  'noRole',
  'changedByNotYou',
  'noDeletion',
  'supervisorOnly',
  'engineerOnly',
  'voidNeedsReason',
  'unknownType',
] as const;
export type RefusalCode = (typeof REFUSAL_CODES)[number];

export const VALIDATE_DOC_UPDATE = `function (newDoc, oldDoc, userCtx) {
  var roles = userCtx.roles || [];
  function has(role) { return roles.indexOf(role) !== -1; }
  if (has('_admin')) return;
  if (!userCtx.name) throw ({ unauthorized: 'signedOut' });
  var staff = ${JSON.stringify(ROLES)};
  var member = false;
  for (var i = 0; i < staff.length; i++) if (has(staff[i])) member = true;
  if (!member) throw ({ forbidden: 'noRole' });
  if (newDoc.changedBy !== userCtx.name) throw ({ forbidden: 'changedByNotYou' });
  if (newDoc._deleted) {
    if (!newDoc.mergedInto) throw ({ forbidden: 'noDeletion' });
    return;
  }
  var engineerTypes = ${JSON.stringify(ENGINEER_TYPES)};
  if (engineerTypes.indexOf(newDoc.type) !== -1) {
    if (!has('engineer')) throw ({ forbidden: 'engineerOnly' });
    return;
  }
  if (newDoc.type !== 'job') throw ({ forbidden: 'unknownType' });
  var held = ${JSON.stringify(SUPERVISOR_STATUSES)};
  var before = oldDoc && !oldDoc._deleted && oldDoc.job ? oldDoc.job.status : null;
  var after = newDoc.job ? newDoc.job.status : null;
  if (before !== after && (held.indexOf(after) !== -1 || held.indexOf(before) !== -1) && !has('supervisor'))
    throw ({ forbidden: 'supervisorOnly' });
  if (newDoc.void && !(typeof newDoc.void.reason === 'string' && newDoc.void.reason.length > 0))
    throw ({ forbidden: 'voidNeedsReason' });
}`;

export function designDocument(): { _id: string; validate_doc_update: string } {
  return { _id: DESIGN_DOC_ID, validate_doc_update: VALIDATE_DOC_UPDATE };
}
