package org.variset.app;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import org.variset.archive.testing.ArchitectureRules;

/**
 * The application layer's rules: below every front end, it knows none of them, never prints or exits, and reaches
 * the archive's writes through its transactions, never through Hibernate.
 */
@AnalyzeClasses(packages = "org.variset.app", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule knowsNoFrontEnd = noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.variset.cli..", "org.variset.web..", "picocli..");

    @ArchTest
    static final ArchRule reachesTheArchiveThroughItsTransactions = noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.hibernate..", "jakarta.persistence..", "java.sql..");

    @ArchTest
    static final ArchRule printsNothing = ArchitectureRules.printsNothing();

    @ArchTest
    static final ArchRule packagesFormNoCycle = ArchitectureRules.noPackageCycles("org.variset.app");
}
