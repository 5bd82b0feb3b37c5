package org.variset.cli;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The rules that span modules, checked over every module's classes; each module checks its own inside it (their
 * {@code ArchitectureTest}s).
 */
@AnalyzeClasses(packages = "org.variset", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule onlyTheCliUsesPicocli = noClasses()
            .that()
            .resideOutsideOfPackage("org.variset.cli..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("picocli..");

    @ArchTest
    static final ArchRule onlyTheCliExits = noClasses()
            .that()
            .doNotHaveFullyQualifiedName("org.variset.cli.VarisetMain")
            .should()
            .callMethod(System.class, "exit", int.class);

    /** The commands parse and render; the use cases, their transactions and their reads live in the app layer. */
    @ArchTest
    static final ArchRule commandsLeaveTheWorkToTheUseCases = noClasses()
            .that()
            .resideInAPackage("org.variset.cli..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.hibernate..", "jakarta.persistence..", "java.sql..")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.archive.store.Archive")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.archive.store.Transaction")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.archive.search.SearchIndex")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.reports.audit.Auditor")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.reports.plan.ResetPlanner")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.reports.trend.TrendReport")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.imports.load.ArchiveImporter")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.imports.export.ArchiveExporter");
}
