package org.variset.cli.command;

import java.time.LocalDate;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.search.SearchRoutes;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.QuerySyntaxException;
import org.variset.archive.search.SearchHits;
import org.variset.archive.search.SearchOrder;
import org.variset.archive.search.SearchRequest;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.ConsoleProgress;
import org.variset.reports.route.RouteText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Searches past sets by move, hold, direction, grade, date and free text. */
@Command(
        name = "search",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Search every route of the archive by moves, holds and the directions they face, grades, "
                    + "dates, walls, setters and free text.",
            "",
            "Query language:",
            "  heel hook              words search names, moves, styles, holds and notes; any spelling of a",
            "                         vocabulary term finds it (heel-hook, heelhook, heel hooks)",
            "  \"slopey top\"           a phrase",
            "  move:dyno  style:power  hold:sloper  hold:pinch@90  grip:down   moves, styles, hold types, a hold",
            "                         type facing a direction (degrees, clock 4:30, or up/right/down-left...),",
            "                         any hand grip facing a direction",
            "  hold:sloper+xl  hold:crimp@up+s   one hold's type, direction and size together (size:xl hold:sloper",
            "                         asks for an xl hold and a sloper, maybe two holds)",
            "  grade:V4  grade:V3..V5  grade:6a..6b+  grade:V5..   grades: the range's own scale by order (V3..V5 never gives V2), other scales by the centre of their span",
            "  band:V4                a band of the gym's grade bands",
            "  set:2026-03  set:2026-01..2026-06  stripped:2026-04  standing:2026-03-02   dates",
            "  gym:  wall:  route:  color:  setter:  discipline:  size:  angle:20..45  notes:",
            "  setter:dario           a setter by a word of their name, or the whole name in quotes",
            "  a b   a AND b   a OR b   NOT a   -a   ( )   combine; names with spaces go in quotes",
            "  wall:cav*              a name that starts with cav",
            ""
        },
        footer = {
            "",
            "Examples:",
            "  variset search heel hook grade:V4..V5 wall:Cave hold:sloper",
            "  variset search \"hold:pinch@270 OR hold:pinch@90\" set:2026-03..2026-05 --facets",
            "  variset search move:undercling --standing-on 2026-06-01 --sort grade --format json",
            "  variset search heel hook wall:Cave --limit 12 --pdf heel-hooks.pdf"
        })
final class SearchCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "QUERY", arity = "1..*", description = "The query (several words are joined).")
    List<String> words;

    @Mixin
    GymOptions gym;

    @Option(names = "--wall", paramLabel = "WALL", description = "Only routes on walls of this name.")
    String wall;

    @Option(
            names = "--standing-on",
            paramLabel = "DATE",
            converter = org.variset.cli.convert.DateConverter.class,
            description = "Only routes up on this day.")
    LocalDate standingOn;

    @Option(
            names = "--limit",
            paramLabel = "N",
            defaultValue = "20",
            description = "How many routes to show (default: ${DEFAULT-VALUE}).")
    int limit;

    @Option(
            names = "--sort",
            paramLabel = "ORDER",
            defaultValue = "relevance",
            description = "relevance, newest or grade (easiest first) (default: ${DEFAULT-VALUE}).")
    SearchOrder order;

    @Option(
            names = "--facets",
            description =
                    "Count the matching routes by move, hold type, grip direction, grade " + "band, wall and setter.")
    boolean facets;

    @Mixin
    FormatOptions format;

    @Mixin
    PdfFileOptions pdf;

    @Override
    ExitCode execute() {
        String query = String.join(" ", words);
        if (limit < 1) {
            throw new IllegalArgumentException("--limit must be at least 1");
        }
        SearchRoutes.Result r;
        LocalDate today;
        try (Workspace w = workspace();
                ConsoleProgress progress = new ConsoleProgress(err(), ConsoleProgress.onTerminal())) {
            r = new SearchRoutes(w)
                    .search(
                            new SearchRequest(query, gym.gym, wall, standingOn, order, limit, facets),
                            (d, t) -> progress.advanced("indexing routes", d));
            today = w.today(gym.gym);
        } catch (QuerySyntaxException e) {
            err().println("variset search: " + e.getMessage());
            err().println(e.pointer());
            err().println("See 'variset search --help' for the query language.");
            return ExitCode.BAD_INPUT;
        }
        if (format.json()) {
            out().println(Json.write(r.json()));
        } else {
            print(r);
        }
        pdf.write(today, err(), r.studySheet());
        return ExitCode.OK;
    }

    private void print(SearchRoutes.Result r) {
        SearchHits hits = r.hits();
        List<RouteRecord> routes = r.routes();
        out().println(
                        hits.total() == 0
                                ? "No route matches."
                                : hits.total() + (hits.total() == 1 ? " route matches" : " routes match")
                                        + (routes.size() < hits.total()
                                                ? "; the first " + routes.size() + " by " + order.word()
                                                : ", by " + order.word())
                                        + ":");
        int n = 0;
        for (RouteRecord x : routes) {
            out().println();
            out().println((++n) + ". " + RouteText.heading(x));
            String moves = RouteText.moves(x);
            if (!moves.isEmpty()) {
                out().println("   " + moves);
            }
            out().println("   " + RouteText.holds(x));
        }
        if (facets) {
            out().println();
            out().println("Matching routes by");
            hits.facets()
                    .forEach((dim, values) -> out().println("  " + String.format("%-7s", dim) + " "
                            + (values.isEmpty()
                                    ? "–"
                                    : String.join(
                                            ", ",
                                            values.stream()
                                                    .map(v -> v.label() + " " + v.count())
                                                    .toList()))));
        }
    }
}
