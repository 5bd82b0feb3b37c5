/**
 * Planning the next reset of a wall: the grade slots that bring the gym's standing set closest to its target, the
 * grip directions, hold types, moves and styles that have fallen behind the gym's last twelve months, and the hold
 * shapes the wall has used lately. {@link org.variset.reports.plan.GradeSlotPlanner} and
 * {@link org.variset.reports.plan.VarietyGaps} are pure; {@link org.variset.reports.plan.ResetPlanner} reads.
 */
package org.variset.reports.plan;
