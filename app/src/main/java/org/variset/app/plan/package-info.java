/** Planning a wall's next reset ({@link org.variset.app.plan.PlanReset}). */
package org.variset.app.plan;
