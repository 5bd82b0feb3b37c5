/**
 * Gyms and their walls, the per-gym settings that take effect on a date, and the gym's own calendar
 * ("today" in the gym's time zone, from an injected clock).
 */
package org.variset.archive.gym;
