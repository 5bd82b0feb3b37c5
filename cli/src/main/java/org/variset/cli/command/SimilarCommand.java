package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.search.FindSimilar;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FeatureText;
import org.variset.reports.route.RouteText;
import org.variset.reports.similar.SimilarRoutes;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Lists the archived routes most like one route. */
@Command(
        name = "similar",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "List the archived routes most like one route, by the Jaccard index over their hand holds "
                    + "with the directions they face, moves, consecutive move pairs, wall-angle band and grade band "
                    + "(1 = the same features, 0 = none shared), with the shared features spelled out.",
            "",
            "ROUTE is the route's label, or GYM/LABEL/SET_ON; when a label names several routes, narrow it with "
                    + "--wall and --set-on."
        },
        footer = {
            "",
            "Examples:",
            "  variset similar C2 --wall Cave --set-on 2026-02-07",
            "  variset similar \"Lantern Rock/C1/2026-10-05\" --limit 5"
        })
final class SimilarCommand extends VarisetSubcommand {
    @Parameters(index = "0", paramLabel = "ROUTE", description = "The route: LABEL or GYM/LABEL/SET_ON.")
    String route;

    @Mixin
    GymOptions gym;

    @Option(names = "--wall", paramLabel = "WALL", description = "The route's wall, when its label is not unique.")
    String wall;

    @Option(
            names = "--set-on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "The day it was set, when its label is not unique.")
    LocalDate setOn;

    @Option(
            names = "--limit",
            paramLabel = "N",
            defaultValue = "10",
            description = "How many routes to list (default: ${DEFAULT-VALUE}).")
    int limit;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        String gymName = gym.gym;
        String label = route;
        LocalDate day = setOn;
        String[] parts = route.split("/");
        if (parts.length == 3) {
            gymName = parts[0];
            label = parts[1];
            day = new DateConverter().convert(parts[2]);
        }
        SimilarRoutes.Result r;
        try (Workspace w = workspace()) {
            r = new FindSimilar(w).find(new FindSimilar.RouteName(gymName, label, wall, day), limit);
        }
        if (format.json()) {
            out().println(Json.write(FindSimilar.json(r)));
            return ExitCode.OK;
        }
        out().println("Routes most like " + RouteText.heading(r.route()));
        if (!r.comparable()) {
            out().println("It has too little detail to compare: fewer than four hand-hold and move features. "
                    + "Record its holds or moves to compare it.");
            return ExitCode.OK;
        }
        if (r.matches().isEmpty()) {
            out().println("None shares a hand hold facing the same way or a move with it.");
        }
        int n = 0;
        for (SimilarRoutes.Match m : r.matches()) {
            out().println();
            out().println((++n) + ". Jaccard "
                    + Figures.JACCARD.text(m.similarity().jaccard()) + " ("
                    + m.similarity().shared() + " of " + m.similarity().union() + " features) · "
                    + RouteText.heading(m.other()));
            out().println("   " + FeatureText.shared(m.similarity().sharedFeatures()));
        }
        return ExitCode.OK;
    }
}
