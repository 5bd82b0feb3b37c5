package org.variset.web;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The web layer renders; the use cases, their transactions, reads, figures and documents live in the app layer. */
@AnalyzeClasses(packages = "org.variset.web", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule pagesLeaveTheWorkToTheUseCases = noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "org.hibernate..",
                    "jakarta.persistence..",
                    "java.sql..",
                    "org.variset.archive.store..",
                    "org.variset.archive.account..",
                    "com.lowagie..",
                    "org.openpdf..",
                    "org.jfree..")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.archive.read.ArchiveCatalog")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.archive.read.RouteReader")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.archive.search.SearchIndex")
            .orShould()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.variset.reports.audit.Auditor");

    @ArchTest
    static final ArchRule securityDoesNotReachIntoPages = noClasses()
            .that()
            .resideInAPackage("org.variset.web.security..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("org.variset.web.page..");

    @ArchTest
    static final ArchRule chartsArePlainCode = noClasses()
            .that()
            .resideInAPackage("org.variset.web.chart..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("io.javalin..", "org.variset.archive..", "org.variset.app..");
}
