package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.internal.IndexUpkeep;
import org.variset.cli.internal.Json;
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
        try (Archive archive = openArchive();
                SearchIndex index = IndexUpkeep.current(archive, err(), IndexProgress.NONE)) {
            GymRecord g = new ArchiveCatalog(archive.connection()).gym(gymName);
            SimilarRoutes similar = new SimilarRoutes(archive.connection());
            RouteRecord target = similar.route(g.name(), label, wall, day);
            r = similar.find(target, index, g, Math.max(1, limit));
        }
        if (format.json()) {
            out().println(Json.write(json(r)));
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

    private static ObjectNode json(SimilarRoutes.Result r) {
        ObjectNode o = Json.object()
                .put("route", r.route().name())
                .put("comparable", r.comparable())
                .put("candidates_scored", r.candidates());
        ArrayNode a = o.putArray("similar");
        for (SimilarRoutes.Match m : r.matches()) {
            ObjectNode x = a.addObject()
                    .put("route", m.other().name())
                    .put("gym", m.other().gym())
                    .put("jaccard", m.similarity().jaccard())
                    .put("shared_count", m.similarity().shared())
                    .put("union_count", m.similarity().union());
            m.similarity().sharedFeatures().forEach(x.putArray("shared")::add);
        }
        return o;
    }
}
