package org.variset.archive;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import org.variset.archive.testing.ArchitectureRules;

/** The archive core's own dependency rules (DEVELOPERS.md, "Where each concern lives"). */
@AnalyzeClasses(packages = "org.variset.archive", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule dependsOnNoOtherModule = noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "org.variset.imports..",
                    "org.variset.reports..",
                    "org.variset.sample..",
                    "org.variset.app..",
                    "org.variset.cli..",
                    "org.variset.web..");

    @ArchTest
    static final ArchRule packagesFormNoCycle = ArchitectureRules.noPackageCycles("org.variset.archive");

    /** Hibernate and JPA stay with the entities, the store and the write operations that use them. */
    @ArchTest
    static final ArchRule hibernateStaysInTheStoreAndTheEntities = noClasses()
            .that()
            .resideOutsideOfPackages(
                    "org.variset.archive.store..",
                    "org.variset.archive.gym..",
                    "org.variset.archive.route..",
                    "org.variset.archive.mapping..",
                    "org.variset.archive.change..",
                    "org.variset.archive.settings..",
                    "org.variset.archive.changelog..",
                    "org.variset.archive.bulk..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.hibernate..", "jakarta.persistence..");

    /** Grades, vocabulary and problems are plain values: no database, no files. */
    @ArchTest
    static final ArchRule valuesStayPure = noClasses()
            .that()
            .resideInAnyPackage(
                    "org.variset.archive.grade..", "org.variset.archive.vocabulary..", "org.variset.archive.problem..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "jakarta.persistence..",
                    "org.hibernate..",
                    "java.sql..",
                    "org.apache.lucene..",
                    "org.variset.archive.store..");

    @ArchTest
    static final ArchRule printsNothing = ArchitectureRules.printsNothing();
}
