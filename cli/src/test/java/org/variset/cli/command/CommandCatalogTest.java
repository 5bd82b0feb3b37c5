package org.variset.cli.command;

import static org.assertj.core.api.Assertions.assertThat;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.cli.CliRun;
import org.variset.cli.ExitCode;
import picocli.CommandLine.Command;

/** The one list of commands (commands.txt) against the command classes, the help, and the launcher that reads it. */
class CommandCatalogTest {
    @TempDir
    Path home;

    @Test
    void listsEveryTopLevelCommandClassUnderItsOwnName() {
        Set<String> listed = CommandCatalog.get().commands().stream()
                .map(e -> e.type().getName())
                .collect(Collectors.toSet());
        List<JavaClass> commands = new ClassFileImporter()
                        .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                        .importPackages("org.variset.cli.command")
                        .stream()
                        .filter(c -> c.isAnnotatedWith(Command.class)
                                && c.getEnclosingClass().isEmpty())
                        .filter(c -> !c.getSimpleName().equals("RootCommand"))
                        .toList();
        assertThat(commands).isNotEmpty();
        assertThat(commands).allSatisfy(c -> assertThat(listed).as(c.getName()).contains(c.getName()));
        for (CommandCatalog.Entry e : CommandCatalog.get().commands()) {
            assertThat(e.type().getAnnotation(Command.class).name())
                    .as(e.type().getName())
                    .isEqualTo(e.name());
        }
    }

    @Test
    void theHelpListsEveryCommandButTheHiddenOne() {
        String help = CliRun.run(home, "--help").exits(ExitCode.OK).out();
        String helpCommand = CliRun.run(home, "help").exits(ExitCode.OK).out();
        for (CommandCatalog.Entry e : CommandCatalog.get().commands()) {
            boolean hidden = e.type().getAnnotation(Command.class).hidden();
            assertThat(help.contains("\n  " + e.name() + " ")).as(e.name()).isEqualTo(!hidden);
            assertThat(helpCommand.contains("\n  " + e.name() + " "))
                    .as(e.name())
                    .isEqualTo(!hidden);
        }
    }

    @Test
    void findsTheCommandWordAfterEveryRootOptionThatTakesAValue() {
        for (String option : CommandCatalog.get().valueOptions()) {
            assertThat(CommandCatalog.get().commandName(new String[] {option, "/x/import", "audit", "--wall", "Cave"}))
                    .as(option)
                    .isEqualTo("audit");
        }
        assertThat(CommandCatalog.get().valueOptions()).contains("--archive", "--db");
    }

    /** The launcher reads the same file from the source tree: the path it names must be this file. */
    @Test
    void theLauncherReadsThisList() throws Exception {
        String launcher = Files.readString(Path.of("../variset"));
        assertThat(launcher).contains("cli/src/main/resources/org/variset/cli/commands.txt");
        assertThat(Path.of("src/main/resources/org/variset/cli/commands.txt")).isRegularFile();
    }

    /** Long work keeps the optimising compiler whichever root option comes first; {@code --db}'s value is skipped. */
    @Test
    void theLauncherGivesLongWorkTheOptimisingCompiler() throws Exception {
        for (CommandCatalog.Entry e : CommandCatalog.get().commands()) {
            for (String option : CommandCatalog.get().valueOptions()) {
                String flags = launcherJit(option, "import", e.name(), "x");
                assertThat(flags)
                        .as(option + " import " + e.name())
                        .isEqualTo(e.longWork() ? "jit: optimising" : "jit: -XX:TieredStopAtLevel=1");
            }
        }
    }

    private static String launcherJit(String... args) throws Exception {
        List<String> command = new java.util.ArrayList<>(List.of("bash", "../variset"));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put("VARISET_LAUNCHER_PRINT_JIT", "1");
        pb.environment().remove("VARISET_JAVA_OPTS");
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8).strip();
        assertThat(p.waitFor()).as(out).isZero();
        return out;
    }
}
