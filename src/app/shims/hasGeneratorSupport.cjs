/*
 * Stands in for @stdlib/assert-has-generator-support in the browser build. The original finds
 * out by calling eval, which the app's Content Security Policy ('self', no 'unsafe-eval')
 * refuses and reports; every browser the build targets (ES2022) has generators, so the answer
 * is known. The stdlib series and continued-fraction helpers then take their generator branch.
 */
'use strict';

module.exports = function hasGeneratorSupport() {
  return true;
};
