/** A gym's trends over a year or a period, and several gyms side by side ({@link org.variset.app.trend.TrendPeriod}). */
package org.variset.app.trend;
