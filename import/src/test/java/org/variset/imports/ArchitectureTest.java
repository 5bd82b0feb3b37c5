package org.variset.imports;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import org.variset.archive.testing.ArchitectureRules;

/** The import module's own rules: files to rows to validated rows to the archive, each layer below the next. */
@AnalyzeClasses(packages = "org.variset.imports", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule readersKnowNothingOfTheArchive = noClasses()
            .that()
            .resideInAnyPackage("org.variset.imports.table..", "org.variset.imports.row..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "org.variset.archive.store..", "org.hibernate..", "java.sql..", "org.variset.imports.load..");

    @ArchTest
    static final ArchRule hibernateOnlyWhereTheArchiveIsWritten = noClasses()
            .that()
            .resideOutsideOfPackages("org.variset.imports.load..", "org.variset.imports.export..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.hibernate..", "jakarta.persistence..");

    @ArchTest
    static final ArchRule dependsOnNoOtherModuleAbove = noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.variset.reports..", "org.variset.app..", "org.variset.cli..", "org.variset.web..");

    @ArchTest
    static final ArchRule packagesFormNoCycle = ArchitectureRules.noPackageCycles("org.variset.imports");

    @ArchTest
    static final ArchRule printsNothing = ArchitectureRules.printsNothing();
}
