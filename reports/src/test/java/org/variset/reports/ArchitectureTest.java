package org.variset.reports;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import org.variset.archive.testing.ArchitectureRules;

/** The reports' own dependency rules: scoring is pure, Hibernate stays in the archive, only front ends print. */
@AnalyzeClasses(packages = "org.variset.reports", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    /** The scoring functions take numbers and categories and return figures: nothing else. */
    @ArchTest
    static final ArchRule scoringStaysPure = noClasses()
            .that()
            .resideInAPackage("org.variset.reports.scoring..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "java.sql..",
                    "java.io..",
                    "java.nio..",
                    "org.hibernate..",
                    "jakarta.persistence..",
                    "org.apache.lucene..",
                    "org.openpdf..",
                    "com.lowagie..",
                    "org.jfree..",
                    "com.fasterxml.jackson..",
                    "org.variset.archive.store..",
                    "org.variset.archive.read..",
                    "org.variset.reports.figures..",
                    "org.variset.reports.audit..",
                    "org.variset.reports.pdf..");

    /** The figures of a set come from routes already read: no database and no documents. */
    @ArchTest
    static final ArchRule figuresStayPure = noClasses()
            .that()
            .resideInAPackage("org.variset.reports.figures..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "java.sql..",
                    "org.hibernate..",
                    "org.variset.archive.store..",
                    "org.openpdf..",
                    "com.lowagie..",
                    "org.variset.reports.pdf..");

    @ArchTest
    static final ArchRule noHibernate =
            noClasses().should().dependOnClassesThat().resideInAnyPackage("org.hibernate..", "jakarta.persistence..");

    @ArchTest
    static final ArchRule dependsOnNoFrontEndOrImport = noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.variset.imports..", "org.variset.app..", "org.variset.cli..", "org.variset.web..");

    @ArchTest
    static final ArchRule packagesFormNoCycle = ArchitectureRules.noPackageCycles("org.variset.reports");

    @ArchTest
    static final ArchRule printsNothing = ArchitectureRules.printsNothing();
}
