package org.variset.archive.testing;

import org.junit.jupiter.api.extension.ConditionEvaluationResult;
import org.junit.jupiter.api.extension.ExecutionCondition;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * In the {@code postgresql} test executions, skips whole test classes, with the reason, when the test server does not
 * answer, before any of their set-up runs; unless {@code -Dvariset.test.requirePostgres=true}, when they run and
 * fail. Registered by JUnit's extension auto-detection, which only those executions turn on.
 */
public final class PostgresAvailability implements ExecutionCondition {
    @Override
    public ConditionEvaluationResult evaluateExecutionCondition(ExtensionContext context) {
        if (!TestArchives.onPostgres() || Boolean.getBoolean(TestArchives.REQUIRE_PROPERTY)) {
            return ConditionEvaluationResult.enabled("no PostgreSQL needed, or it is required");
        }
        String why = TestArchives.unreachable();
        return why == null
                ? ConditionEvaluationResult.enabled("PostgreSQL answers")
                : ConditionEvaluationResult.disabled("skipped: " + why);
    }
}
