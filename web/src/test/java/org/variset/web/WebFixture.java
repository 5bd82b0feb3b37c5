package org.variset.web;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.List;
import org.variset.app.Notices;
import org.variset.app.Workspace;
import org.variset.app.account.Accounts;
import org.variset.app.account.Role;
import org.variset.app.imports.ImportFiles;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/**
 * A served archive of two invented gyms (Quarry Loft, Kiln Yard), with one account per role and a setter limited to
 * Kiln Yard; a route of Quarry Loft is named with markup, to show that pages print it as text.
 */
final class WebFixture implements AutoCloseable {
    static final String PASSWORD = "granite stairs at dawn";
    static final String SCRIPT_NAME = "<script>alert(1)</script>";

    /** A clock the tests move on. */
    static final class MovableClock extends Clock {
        private volatile Instant now = Instant.parse("2026-12-02T10:00:00Z");

        void advance(Duration d) {
            now = now.plus(d);
        }

        @Override
        public ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(ZoneId zone) {
            return this;
        }

        @Override
        public Instant instant() {
            return now;
        }
    }

    final MovableClock clock;
    final Workspace workspace;
    final WebServer server;

    private WebFixture(Workspace workspace, WebServer server, MovableClock clock) {
        this.workspace = workspace;
        this.server = server;
        this.clock = clock;
    }

    static WebFixture start(Path dir) throws Exception {
        return start(dir, ServeOptions.loopback(0));
    }

    static WebFixture start(Path dir, ServeOptions options) throws Exception {
        Path routes = Files.writeString(
                dir.resolve("routes.csv"),
                "gym,wall,route,set_on,discipline,grade,reset,setters,moves\n"
                        + "Quarry Loft,Cave,Q1,2026-11-02,boulder,V3,Cave 2026-11-02,Ines Varga,heel hook;match\n"
                        + "Quarry Loft,Cave,\"" + SCRIPT_NAME + "\",2026-11-02,boulder,V5,Cave 2026-11-02,"
                        + "Ines Varga,dyno\n"
                        + "Quarry Loft,Cave,Q3,2026-11-02,boulder,V1,Cave 2026-11-02,Olek Brandt,heel hook\n"
                        + "Kiln Yard,Chimney,K1,2026-11-10,boulder,V2,Chimney 2026-11-10,Olek Brandt,smear\n",
                StandardCharsets.UTF_8);
        Path holds = Files.writeString(
                dir.resolve("holds.csv"),
                "gym,wall,route,set_on,seq,role,type,size,grip,hold_ref,x_m,y_m\n"
                        + "Quarry Loft,Cave,Q1,2026-11-02,1,start,jug,l,0,J1,1.0,0.8\n"
                        + "Quarry Loft,Cave,Q1,2026-11-02,2,hand,crimp,s,90,C4,1.4,1.5\n"
                        + "Quarry Loft,Cave,Q1,2026-11-02,3,finish,jug,l,0,J2,1.2,2.6\n",
                StandardCharsets.UTF_8);
        Workspace w = Workspace.over(TestArchives.fresh(), Clock.systemUTC(), Notices.NONE);
        new ImportFiles(w).run(List.of(routes, holds), ImportOptions.defaults(), ImportProgress.NONE);
        Accounts accounts = new Accounts(w);
        accounts.add("ada", Role.ADMIN, List.of(), PASSWORD.toCharArray());
        accounts.add("hana", Role.HEAD_SETTER, List.of(), PASSWORD.toCharArray());
        accounts.add("sol", Role.SETTER, List.of(), PASSWORD.toCharArray());
        accounts.add("vik", Role.VIEWER, List.of(), PASSWORD.toCharArray());
        accounts.add("kilnonly", Role.SETTER, List.of("Kiln Yard"), PASSWORD.toCharArray());
        MovableClock clock = new MovableClock();
        return new WebFixture(w, WebServer.start(w, options, clock), clock);
    }

    /** The id of a route by its label, read from the archive. */
    long routeId(String label) throws Exception {
        try (var s = workspace.archive().connection().prepareStatement("SELECT id FROM route WHERE label = ?")) {
            s.setString(1, label);
            try (var rs = s.executeQuery()) {
                return rs.next() ? rs.getLong(1) : -1;
            }
        }
    }

    String base() {
        return server.address().replaceAll("/$", "");
    }

    @Override
    public void close() {
        if (server != null) {
            server.close();
        }
        workspace.close();
    }
}
