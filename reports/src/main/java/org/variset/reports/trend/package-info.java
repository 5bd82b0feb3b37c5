/**
 * Trends over a period: month-end figures of the gym's and each wall's standing set, resets per wall and how long
 * each wall has been up against its cycle, route lifetimes, the setter mix with each setter's profile, the period's
 * grades against the target and its notable repeats. {@link org.variset.reports.trend.TrendReport} reads the
 * gym's routes once; the rest is computed in memory.
 */
package org.variset.reports.trend;
