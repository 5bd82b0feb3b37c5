/**
 * Routes most like a given one: candidates from the search index, each scored exactly with the Jaccard index over
 * the feature sets of docs/spec/metrics.md section 5, shared features spelled out.
 */
package org.variset.reports.similar;
