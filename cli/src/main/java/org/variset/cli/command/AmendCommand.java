package org.variset.cli.command;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import org.variset.app.Workspace;
import org.variset.app.change.AmendRoute;
import org.variset.archive.change.RouteCorrection;
import org.variset.archive.grade.GradeScale;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.convert.GradeScaleConverter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;

/** Corrects one route's fields without re-importing a file. */
@Command(
        name = "amend",
        mixinStandardHelpOptions = true,
        description = {
            "Correct one route: its grade, setters, moves, styles, move difficulties, colour, notes or "
                    + "strip date. Lists are separated by ;."
        },
        footer = {
            "",
            "Examples:",
            "  variset amend \"Blue 3\" --wall Cave --set-on 2026-03-02 --grade V5",
            "  variset amend N1 --wall \"North Arch\" --set-on 2026-03-02 --setters \"Kit Ames;Rui Sol\"",
            "  variset amend N1 --wall \"North Arch\" --set-on 2026-03-02 --still-up"
        })
final class AmendCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "ROUTE", description = "The route's label.")
    String label;

    @Mixin
    GymOptions gym;

    @Option(names = "--wall", required = true, paramLabel = "WALL", description = "The route's wall.")
    String wall;

    @Option(
            names = "--set-on",
            required = true,
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "The day the route went up (with the label and wall, what identifies it).")
    LocalDate setOn;

    @Option(names = "--grade", paramLabel = "GRADE", description = "The grade as written.")
    String grade;

    @Option(
            names = "--scale",
            paramLabel = "SCALE",
            converter = GradeScaleConverter.class,
            description = "The grade's scale, when it fits two.")
    GradeScale scale;

    @Option(names = "--setters", paramLabel = "NAMES", description = "Setters, separated by ;.")
    String setters;

    @Option(names = "--moves", paramLabel = "MOVES", description = "Moves in climbing order, separated by ;.")
    String moves;

    @Option(names = "--styles", paramLabel = "STYLES", description = "Style tags, separated by ;.")
    String styles;

    @Option(names = "--move-difficulty", paramLabel = "LIST", description = "Numbers 1-10, separated by ;.")
    String difficulty;

    @Option(
            names = "--stripped-on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "The day it came down.")
    LocalDate strippedOn;

    @Option(names = "--still-up", description = "The route is still up (clears the strip date).")
    boolean stillUp;

    @Option(names = "--color", paramLabel = "COLOUR", description = "Hold or tape colour.")
    String color;

    @Option(names = "--notes", paramLabel = "TEXT", description = "Notes.")
    String notes;

    @Override
    ExitCode execute() {
        if (stillUp && strippedOn != null) {
            throw new ParameterException(spec.commandLine(), "give --stripped-on or --still-up, not both");
        }
        RouteCorrection c = new RouteCorrection(
                grade,
                scale,
                list(setters),
                list(moves),
                list(styles),
                difficulty == null
                        ? null
                        : list(difficulty).stream().map(AmendCommand::number).toList(),
                strippedOn,
                stillUp,
                color,
                notes);
        RouteCorrection.Result r;
        try (Workspace w = workspace()) {
            r = new AmendRoute(w).amend(gym.gym, wall, label, setOn, c);
        }
        if (r.changed().isEmpty()) {
            out().println("Nothing to change: give at least one field (see --help).");
        } else {
            out().println("Amended " + r.route() + ":");
            r.changed().forEach(x -> out().println("  " + x));
        }
        return ExitCode.OK;
    }

    private static List<String> list(String text) {
        return text == null
                ? null
                : Arrays.stream(text.split(";"))
                        .map(String::strip)
                        .filter(x -> !x.isEmpty())
                        .toList();
    }

    private static Integer number(String text) {
        try {
            return Integer.parseInt(text);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--move-difficulty: '" + text + "' is not a whole number (expected "
                    + "numbers 1 to 10 separated by ;)");
        }
    }
}
