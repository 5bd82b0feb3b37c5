package org.variset.archive.search;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.route.Route;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;
import org.variset.archive.vocabulary.Vocabulary;

class SearchIndexTest {
    private Archive archive;
    private SearchIndex index;
    private Map<Long, String> names;

    @BeforeEach
    void indexTheFixture() {
        archive = TestArchives.fresh();
        archive.inTransaction(SearchFixture::store);
        index = SearchIndex.inMemory();
        assertThat(index.sync(archive.connection(), IndexProgress.NONE).action())
                .isEqualTo(IndexSync.Action.REBUILT);
        names = new java.util.HashMap<>();
        new RouteReader(archive.connection())
                .read(RouteFilter.all())
                .forEach(r -> names.put(r.id(), r.gym().charAt(0) + ":" + r.label()));
    }

    @AfterEach
    void close() {
        index.close();
        archive.close();
    }

    private List<String> find(String query) {
        return find(new SearchRequest(query, null, null, null, SearchOrder.GRADE, 50, false));
    }

    private List<String> find(SearchRequest r) {
        return index.search(r, Vocabulary.defaults()).hits().stream()
                .map(h -> names.get(h.routeId()))
                .toList();
    }

    @Nested
    class Fields {
        @ParameterizedTest(name = "{0}")
        @CsvSource(
                delimiter = '|',
                value = {
                    "gym:quayside|Q:Q1",
                    "gym:\"Birchfield\" wall:tower|B:T1,B:T2",
                    "route:C2|B:C2",
                    "label:c2|B:C2",
                    "color:red|B:C1,Q:Q1",
                    "colour:RED|B:C1,Q:Q1",
                    "setter:\"bo renner\"|B:C3,B:C2",
                    "setter:bo|B:C3,B:C2",
                    "setter:Renner|B:C3,B:C2",
                    "setter:ren*|B:C3,B:C2",
                    "discipline:rope|B:T1,B:T2",
                    "band:V5|B:C2",
                    "size:m discipline:rope|B:T1,B:T2",
                    "style:slopey|B:C2",
                    "style:endurance|B:T1",
                    "notes:top|B:C2",
                    "wall:cav*|B:C3,B:C1,Q:Q1,B:C2,B:C4",
                    "angle:30..40|B:C3,B:C1,B:C2,B:C4",
                    "angle:..10|B:T1,B:T2"
                })
        void findRoutesByEachField(String query, String expected) {
            assertThat(find(query)).containsExactly(expected.split(","));
        }

        @ParameterizedTest(name = "{0}")
        @CsvSource(
                delimiter = '|',
                value = {
                    "move:\"heel hook\"",
                    "move:heel-hook",
                    "move:heelhook",
                    "move:\"heel hooks\"",
                    "move:\"Heel Hook\"",
                    "\"heel hook\"",
                    "heel hook",
                    "heelhook",
                    "heel-hook",
                    "heel hooks"
                })
        void matchEverySpellingOfAMove(String query) {
            assertThat(find(query)).containsExactlyInAnyOrder("B:C1", "B:C3", "Q:Q1");
        }

        /** docs/spec/vocabulary.md: toe catch is a spelling of toe hook, lunge of dyno, chip of foot-chip. */
        @Test
        void followTheVocabularysSynonyms() {
            assertThat(find("move:\"toe catch\"")).containsExactly("B:C2");
            assertThat(find("toe catch")).containsExactly("B:C2");
            assertThat(find("lunge")).containsExactlyInAnyOrder("B:C1", "Q:Q1", "B:C4");
            assertThat(find("hold:slopers")).containsExactly("B:C2");
        }

        @Test
        void followAGymsOwnSynonyms() {
            Vocabulary gyms = Vocabulary.defaults().extendedWith("[moves]\nheel hook: hooky heel\n");
            assertThat(index.search(
                                    new SearchRequest(
                                            "move:\"hooky heel\"", null, null, null, SearchOrder.GRADE, 10, false),
                                    gyms)
                            .total())
                    .isEqualTo(3);
        }

        /** C2 has an m sloper facing down and an xl crimp facing up: apart, the terms match it; together, no hold. */
        @Test
        void askForOneHoldsTypeDirectionAndSizeTogether() {
            assertThat(find("size:xl hold:sloper")).containsExactly("B:C2");
            assertThat(find("hold:sloper+xl")).isEmpty();
            assertThat(find("hold:sloper+m")).containsExactly("B:C2");
            assertThat(find("hold:crimp+xl")).containsExactly("B:C2");
            assertThat(find("hold:crimp@up+xl")).containsExactly("B:C2");
            assertThat(find("hold:crimp@90+xl")).isEmpty();
        }

        @Test
        void findHoldsByTypeAndDirection() {
            assertThat(find("hold:pinch")).containsExactlyInAnyOrder("B:C1", "B:C3", "Q:Q1");
            assertThat(find("hold:pinch@90")).containsExactlyInAnyOrder("B:C1", "Q:Q1");
            assertThat(find("hold:pinch@left")).containsExactly("B:C3");
            assertThat(find("hold:crimp@45")).containsExactly("B:C4");
            assertThat(find("hold:crimp@1:30")).containsExactly("B:C4");
            assertThat(find("grip:down")).containsExactly("B:C2");
            assertThat(find("facing:180")).containsExactly("B:C2");
        }
    }

    @Nested
    class Grades {
        /**
         * docs/spec/grades.md, "Grade ranges", on the IRCRA table (Draper et al. 2015): V routes by their order in V
         * (V3 16.5 to V5 19); a Font route by the centre of its span within the rows V3..V5 covers (16 to 19, so 15.5
         * to 19.5): Font 6A (rows 15 and 16, centre 15.5) has half its span on row 16 and is in.
         */
        @Test
        void findARangeInOneScale() {
            assertThat(find("grade:V3..V5")).containsExactly("B:C3", "B:C1", "Q:Q1", "B:C2");
            assertThat(find("grade:V8")).containsExactly("B:C4");
            assertThat(find("grade:V5..")).containsExactly("B:C2", "B:C4");
            assertThat(find("grade:..V3")).containsExactly("B:C3", "B:C1");
        }

        /**
         * Font 6A spans levels 15 and 16 (value 15.5), Font 6B+ 18 and 19. French 6a is 11 and YDS 5.11b 15
         * (docs/spec/grades.md, from Draper et al. 2015). {@code 6a..6b+} reads as Font for boulders and French for rope.
         */
        @Test
        void compareMixedScalesOnTheIrcraAxis() {
            assertThat(find("grade:6A..V4")).containsExactly("B:C3", "B:C1", "Q:Q1");
            assertThat(find("grade:6a..6b+")).containsExactly("B:T1", "B:C3", "B:C1", "Q:Q1");
            assertThat(find("grade:5.11a..5.11c")).containsExactly("B:T2");
            assertThat(find("discipline:boulder grade:6a..6b+")).containsExactly("B:C3", "B:C1", "Q:Q1");
        }
    }

    @Nested
    class Dates {
        @Test
        void findBySetAndStripDates() {
            assertThat(find("set:2026-02")).containsExactly("B:C3", "Q:Q1", "B:C2");
            assertThat(find("set:2026-01-10..2026-01-20")).containsExactly("B:T1", "B:T2", "B:C1");
            assertThat(find("set:2026-03..")).containsExactly("B:C4");
            assertThat(find("stripped:2026-02")).containsExactly("B:C1");
        }

        /** Up on d when set_on &lt;= d &lt; stripped_on: C1 is down on 2026-02-07, the day C2 and C3 went up. */
        @Test
        void findWhatWasUpOnADay() {
            assertThat(find("standing:2026-02-06 wall:cave gym:birchfield")).containsExactly("B:C1");
            assertThat(find("standing:2026-02-07 wall:cave gym:birchfield")).containsExactly("B:C3", "B:C2");
            assertThat(find(new SearchRequest(
                            "dyno", "Birchfield", null, LocalDate.parse("2026-03-20"), SearchOrder.GRADE, 10, false)))
                    .containsExactly("B:C4");
            assertThat(find("standing:2026-02 gym:birchfield wall:cave")).containsExactly("B:C3", "B:C1", "B:C2");
        }
    }

    @Nested
    class Logic {
        @Test
        void combinesWithAndOrNotAndParentheses() {
            assertThat(find("dyno heel hook")).containsExactlyInAnyOrder("B:C1", "Q:Q1");
            assertThat(find("dyno AND NOT gym:quayside")).containsExactlyInAnyOrder("B:C1", "B:C4");
            assertThat(find("dyno -gym:quayside")).containsExactlyInAnyOrder("B:C1", "B:C4");
            assertThat(find("mantle OR gaston")).containsExactlyInAnyOrder("B:C2", "B:C3");
            assertThat(find("(mantle OR gaston) setter:\"Ada Quill\"")).containsExactly("B:C2");
            assertThat(find("NOT discipline:boulder")).containsExactlyInAnyOrder("B:T1", "B:T2");
        }

        @Test
        void ordersNewestFirstOrByGrade() {
            assertThat(find(new SearchRequest(
                            "gym:birchfield wall:cave", null, null, null, SearchOrder.NEWEST, 10, false)))
                    .containsExactly("B:C4", "B:C2", "B:C3", "B:C1");
            assertThat(find(new SearchRequest("wall:cave", null, null, null, SearchOrder.GRADE, 2, false)))
                    .containsExactly("B:C3", "B:C1");
        }

        @Test
        void countsTheMatchingRoutesByFacet() {
            SearchHits h = index.search(
                    new SearchRequest("gym:birchfield", null, null, null, SearchOrder.RELEVANCE, 1, true),
                    Vocabulary.defaults());
            assertThat(h.total()).isEqualTo(6);
            assertThat(h.hits()).hasSize(1);
            assertThat(h.facets().get("move"))
                    .contains(new SearchHits.FacetCount("dyno", 2), new SearchHits.FacetCount("heel hook", 2));
            assertThat(h.facets().get("wall"))
                    .containsExactly(new SearchHits.FacetCount("Cave", 4), new SearchHits.FacetCount("Tower", 2));
            assertThat(h.facets().get("grip")).contains(new SearchHits.FacetCount("up", 5));
            assertThat(h.facets().get("band"))
                    .contains(new SearchHits.FacetCount("V3", 1), new SearchHits.FacetCount("6a", 1));
            assertThat(h.facets().get("setter")).contains(new SearchHits.FacetCount("Ada Quill", 3));
        }
    }

    @Nested
    class BadQueries {
        @ParameterizedTest(name = "{0}")
        @CsvSource(
                delimiter = '|',
                value = {
                    "move:dyno grade:|17|expected a value after 'grade:'",
                    "(dyno OR mantle|16|expected ')' to close the '(' at position 1",
                    "dyno)|5|this ')' closes no '('",
                    "dyno OR|8|expected a search term after OR",
                    "dyno AND|9|expected a search term after AND",
                    "\"heel hook|1|this quote is not closed",
                    "grip:sideways|6|'sideways' is not a direction",
                    "grade:V99..V3|7|not a grade",
                    "grade:V6..V3|7|runs from harder to easier",
                    "set:2026-13|5|not a real date",
                    "colr:red|1|there is no field 'colr'",
                    "angle:steep|7|not an angle",
                    "grade:5+|7|French 5+",
                    "hold:sloper+huge|13|'huge' is not a hold size",
                    "   |1|the query is empty"
                })
        void sayWhereAndWhatWasExpected(String query, int position, String message) {
            assertThatThrownBy(() -> find(query)).isInstanceOfSatisfying(QuerySyntaxException.class, e -> {
                assertThat(e.position()).isEqualTo(position);
                assertThat(e.getMessage()).contains(message);
            });
        }

        @Test
        void pointsAtThePositionUnderTheQuery() {
            QuerySyntaxException e = org.junit.jupiter.api.Assertions.assertThrows(
                    QuerySyntaxException.class, () -> find("dyno grade:"));
            assertThat(e.pointer()).isEqualTo("  dyno grade:\n" + "  " + " ".repeat(11) + "^");
        }
    }

    @Nested
    class KeepingCurrent {
        @Test
        void catchesUpWithChangesAndDeletions() {
            archive.inTransaction(s -> {
                Route c1 = s.createSelectionQuery("from Route where label = 'C1'", Route.class)
                        .getSingleResult();
                c1.setMoves(List.of("bicycle"));
                ChangeLog.routes(s, List.of(c1.id()));
                Route t2 = s.createSelectionQuery("from Route where label = 'T2'", Route.class)
                        .getSingleResult();
                ChangeLog.routes(s, List.of(t2.id()));
                s.remove(t2);
            });
            assertThat(index.stamp()).isLessThan(ChangeLog.stamp(archive.connection()));
            IndexSync sync = index.sync(archive.connection(), IndexProgress.NONE);
            assertThat(sync.action()).isEqualTo(IndexSync.Action.CAUGHT_UP);
            assertThat(sync.routes()).isEqualTo(2);
            assertThat(find("bicycle")).containsExactly("B:C1");
            assertThat(find("discipline:rope")).containsExactly("B:T1");
            assertThat(index.sync(archive.connection(), IndexProgress.NONE).action())
                    .isEqualTo(IndexSync.Action.CURRENT);
        }

        @Test
        void rebuildsToTheSameResults() throws IOException {
            List<String> queries = List.of(
                    "heel hook",
                    "grade:6a..6b+",
                    "standing:2026-02-07",
                    "hold:crimp@0",
                    "NOT discipline:boulder",
                    "set:2026-02 OR notes:top");
            List<List<String>> before =
                    queries.stream().map(SearchIndexTest.this::find).toList();
            List<Long> ids = index.ids();
            index.rebuild(archive.connection(), IndexProgress.NONE, "asked for");
            assertThat(queries.stream().map(SearchIndexTest.this::find).toList())
                    .isEqualTo(before);
            assertThat(index.ids()).containsExactlyInAnyOrderElementsOf(ids);
            assertThat(ids)
                    .hasSize(new RouteReader(archive.connection())
                            .read(RouteFilter.all())
                            .size());
        }

        @Test
        void rebuildsAnIndexThatIsMissingDamagedOrAhead(@TempDir Path dir) throws Exception {
            try (SearchIndex onDisk = SearchIndex.at(dir)) {
                IndexSync first = onDisk.sync(archive.connection(), IndexProgress.NONE);
                assertThat(first.action()).isEqualTo(IndexSync.Action.REBUILT);
                assertThat(first.notice()).contains("there was none yet");
            }
            try (var files = Files.list(dir.resolve("index"))) {
                for (Path f : files.filter(p -> p.getFileName().toString().startsWith("segments"))
                        .toList()) {
                    Files.write(f, new byte[] {1, 2, 3});
                }
            }
            try (SearchIndex damaged = SearchIndex.at(dir)) {
                assertThat(damaged.stamp()).isEqualTo(-1);
                IndexSync again = damaged.sync(archive.connection(), IndexProgress.NONE);
                assertThat(again.action()).isEqualTo(IndexSync.Action.REBUILT);
                assertThat(again.notice()).contains("unreadable");
                assertThat(damaged.ids()).hasSize(7);
            }
            if (!TestArchives.onPostgres()) {
                // An embedded archive restored from an older backup: its newest change is older than the index's.
                try (var s = archive.connection().createStatement()) {
                    s.execute("DELETE FROM route_change WHERE id = (SELECT MAX(id) FROM route_change)");
                }
                try (SearchIndex ahead = SearchIndex.at(dir)) {
                    assertThat(ahead.sync(archive.connection(), IndexProgress.NONE)
                                    .notice())
                            .contains("ahead of the archive");
                }
            }
            try (Archive fresh = TestArchives.fresh();
                    SearchIndex other = SearchIndex.at(dir)) {
                assertThat(other.sync(fresh.connection(), IndexProgress.NONE).notice())
                        .contains("built from another" + " archive");
                assertThat(other.ids()).isEmpty();
            }
        }

        @Test
        void seesWhatAnotherHandleOnTheSameFolderCommitted(@TempDir Path dir) {
            try (SearchIndex searching = SearchIndex.at(dir);
                    SearchIndex writing = SearchIndex.at(dir)) {
                writing.sync(archive.connection(), IndexProgress.NONE);
                SearchRequest bicycle = new SearchRequest("bicycle", null, null, null, SearchOrder.RELEVANCE, 5, false);
                assertThat(searching.search(bicycle, Vocabulary.defaults()).total())
                        .isZero();
                archive.inTransaction(s -> {
                    Route c1 = s.createSelectionQuery("from Route where label = 'C1'", Route.class)
                            .getSingleResult();
                    c1.setMoves(List.of("bicycle"));
                    ChangeLog.routes(s, List.of(c1.id()));
                });
                writing.sync(archive.connection(), IndexProgress.NONE);
                assertThat(searching.search(bicycle, Vocabulary.defaults()).total())
                        .isEqualTo(1);
            }
        }

        @Test
        void readsHitsBackFromTheDatabase() {
            SearchHits h = index.search(
                    new SearchRequest("route:C4", null, null, null, SearchOrder.RELEVANCE, 5, false),
                    Vocabulary.defaults());
            RouteRecord r = new RouteReader(archive.connection())
                    .read(RouteFilter.all().withIds(List.of(h.hits().get(0).routeId())))
                    .get(0);
            assertThat(r.moves()).containsExactly("campus", "dyno");
        }
    }
}
