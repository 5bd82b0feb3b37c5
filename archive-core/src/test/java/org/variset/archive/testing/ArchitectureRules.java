package org.variset.archive.testing;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.lang.ArchRule;

/** The architecture rules every module below the front ends states about itself, written once. */
public final class ArchitectureRules {
    private ArchitectureRules() {}

    /** Nothing prints to the console or exits the JVM: only front ends do. */
    public static ArchRule printsNothing() {
        return noClasses()
                .should()
                .accessField(System.class, "out")
                .orShould()
                .accessField(System.class, "err")
                .orShould()
                .callMethod(System.class, "exit", int.class);
    }

    /** The packages directly below {@code base} form no cycle. */
    public static ArchRule noPackageCycles(String base) {
        return slices().matching(base + ".(*)..").should().beFreeOfCycles();
    }
}
