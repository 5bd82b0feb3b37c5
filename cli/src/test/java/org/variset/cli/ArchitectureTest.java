package org.variset.cli;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The dependency rules of DEVELOPERS.md, checked over every module's classes. */
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
    static final ArchRule coreDependsOnNoOtherModule = noClasses()
            .that()
            .resideInAPackage("org.variset.archive..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                    "org.variset.imports..", "org.variset.reports..", "org.variset.sample..", "org.variset.cli..");

    @ArchTest
    static final ArchRule gradesStayPure = noClasses()
            .that()
            .resideInAPackage("org.variset.archive.grade..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("jakarta.persistence..", "org.hibernate..", "org.variset.archive.store..");

    @ArchTest
    static final ArchRule onlyTheCliExits = noClasses()
            .that()
            .doNotHaveFullyQualifiedName("org.variset.cli.VarisetMain")
            .should()
            .callMethod(System.class, "exit", int.class);
}
