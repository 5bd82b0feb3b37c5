/**
 * The seeded generator of invented gyms: the bundled sample (one gym, two years, seven walls, with planted stories
 * for the audits to find) and large synthetic chains for benchmarks and scale tests, written as interchange CSV files
 * and streamed to disk. The same seed gives the same bytes.
 */
package org.variset.sample.generate;
