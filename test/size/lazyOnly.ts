/** Sources that belong in lazily loaded chunks only (checked on the build by `npm run size`). */

/** The physics readers of the planner and the lab: only they write the codes whose words wait for the rest of a locale. */
export const LEFT_TO_REST_READERS = [
  /src\/physics\/planner\//,
  /src\/physics\/traverse\//,
  /src\/physics\/plantThreshold\.ts$/,
];

export const LAZY_ONLY = [
  /node_modules\/idb\//,
  /node_modules\/valibot\//,
  /node_modules\/papaparse\//,
  /node_modules\/pouchdb/,
  /src\/jobs\/(store|schema|migrations|logIndex|fieldMerge|legacyLog)/,
  ...LEFT_TO_REST_READERS,
];
