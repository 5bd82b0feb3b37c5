package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.variset.archive.gym.GymCalendar;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.QuerySyntaxException;
import org.variset.archive.search.SearchHits;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.search.SearchOrder;
import org.variset.archive.search.SearchRequest;
import org.variset.archive.search.SearchVocabulary;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.ConsoleProgress;
import org.variset.cli.internal.IndexUpkeep;
import org.variset.cli.internal.Json;
import org.variset.reports.pdf.StudySheetPdf;
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
            "  grade:V4  grade:V3..V5  grade:6a..6b+  grade:V5..   grades in any scale, compared on the IRCRA axis",
            "  band:V4                a band of the gym's grade bands",
            "  set:2026-03  set:2026-01..2026-06  stripped:2026-04  standing:2026-03-02   dates",
            "  gym:  wall:  route:  color:  setter:  discipline:  size:  angle:20..45  notes:",
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
        try (Archive archive = openArchive();
                ConsoleProgress progress = new ConsoleProgress(err(), ConsoleProgress.onTerminal());
                SearchIndex index =
                        IndexUpkeep.current(archive, err(), (d, t) -> progress.advanced("indexing routes", d))) {
            if (gym.gym != null) {
                new ArchiveCatalog(archive.connection()).gym(gym.gym);
            }
            LocalDate today = new GymCalendar(root().cli().clock()).today(java.time.ZoneOffset.UTC);
            SearchHits hits = index.search(
                    new SearchRequest(query, gym.gym, wall, standingOn, order, limit, facets),
                    SearchVocabulary.of(archive.connection(), gym.gym, today));
            List<RouteRecord> routes = inOrder(
                    hits,
                    new RouteReader(archive.connection())
                            .read(RouteFilter.all()
                                    .withIds(hits.hits().stream()
                                            .map(SearchHits.Hit::routeId)
                                            .toList())));
            if (format.json()) {
                out().println(Json.write(json(query, hits, routes)));
            } else {
                print(hits, routes);
            }
            pdf.write(today, err(), (options, out) -> StudySheetPdf.write(query, hits.total(), routes, options, out));
        } catch (QuerySyntaxException e) {
            err().println("variset search: " + e.getMessage());
            err().println(e.pointer());
            err().println("See 'variset search --help' for the query language.");
            return ExitCode.BAD_INPUT;
        }
        return ExitCode.OK;
    }

    private static List<RouteRecord> inOrder(SearchHits hits, List<RouteRecord> read) {
        Map<Long, RouteRecord> byId = new HashMap<>();
        read.forEach(r -> byId.put(r.id(), r));
        return hits.hits().stream()
                .map(h -> byId.get(h.routeId()))
                .filter(java.util.Objects::nonNull)
                .toList();
    }

    private void print(SearchHits hits, List<RouteRecord> routes) {
        out().println(
                        hits.total() == 0
                                ? "No route matches."
                                : hits.total() + (hits.total() == 1 ? " route matches" : " routes match")
                                        + (routes.size() < hits.total()
                                                ? "; the first " + routes.size() + " by " + order.word()
                                                : ", by " + order.word())
                                        + ":");
        int n = 0;
        for (RouteRecord r : routes) {
            out().println();
            out().println((++n) + ". " + RouteText.heading(r));
            String moves = RouteText.moves(r);
            if (!moves.isEmpty()) {
                out().println("   " + moves);
            }
            out().println("   " + RouteText.holds(r));
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

    private ObjectNode json(String query, SearchHits hits, List<RouteRecord> routes) {
        ObjectNode o = Json.object()
                .put("query", query)
                .put("total", hits.total())
                .put("shown", routes.size())
                .put("sort", order.word());
        ArrayNode a = o.putArray("hits");
        for (int i = 0; i < routes.size(); i++) {
            RouteRecord r = routes.get(i);
            ObjectNode h = a.addObject()
                    .put("id", r.id())
                    .put("gym", r.gym())
                    .put("wall", r.wall())
                    .put("route", r.label())
                    .put("discipline", r.discipline().word())
                    .put("grade", r.gradeText())
                    .put("ircra", r.ircra())
                    .put("set_on", r.setOn().toString())
                    .put(
                            "stripped_on",
                            r.strippedOn() == null ? null : r.strippedOn().toString())
                    .put("score", hits.hits().get(i).score());
            r.setters().forEach(h.putArray("setters")::add);
            r.moves().forEach(h.putArray("moves")::add);
            r.styles().forEach(h.putArray("styles")::add);
            ArrayNode holds = h.putArray("holds");
            for (HoldRecord x : r.holds()) {
                ObjectNode hold = holds.addObject()
                        .put("role", x.role().word())
                        .put("type", x.type())
                        .put("size", x.size() == null ? null : x.size().word())
                        .put("hold_ref", x.holdRef());
                x.grips().forEach(hold.putArray("grip")::add);
            }
        }
        if (facets) {
            ObjectNode f = o.putObject("facets");
            hits.facets().forEach((dim, values) -> {
                ObjectNode d = f.putObject(dim);
                values.forEach(v -> d.put(v.label(), v.count()));
            });
        }
        return o;
    }
}
