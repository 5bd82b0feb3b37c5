package org.variset.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** Importing from the browser, at the HTTP level: checked by content, dry run first, all or nothing. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class WebImportTest {
    private static final String HEAD = "gym,wall,route,set_on,discipline,grade\n";

    @TempDir
    static Path dir;

    private WebFixture fx;

    @BeforeAll
    void start() throws Exception {
        fx = WebFixture.start(dir, ServeOptions.loopback(0).withUploadLimit(64 * 1024));
    }

    @AfterAll
    void stop() {
        fx.close();
    }

    private long routes() throws Exception {
        try (var s = fx.workspace.archive().connection().createStatement();
                var rs = s.executeQuery("SELECT COUNT(*) FROM route")) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private Client setter() throws Exception {
        Client c = new Client(fx.base());
        c.signIn("sol", WebFixture.PASSWORD);
        c.get("/import");
        return c;
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void listsTheLocatedProblemsOfABadFileAndImportsNothing() throws Exception {
        long before = routes();
        HttpResponse<String> r = setter().postFiles(
                        "/import",
                        Map.of(),
                        Map.of(
                                "routes.csv",
                                utf8(HEAD + "Quarry Loft,Cave,Q9,2026-11-20,boulder,V3\n"
                                        + "Quarry Loft,Cave,Q10,2026-11-20,boulder,V99\n")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("Nothing was imported", "routes.csv", "<td class=\"num\">3</td>", "grade");
        assertThat(routes()).isEqualTo(before);
    }

    @Test
    void checksAFileByItsContentNotItsName() throws Exception {
        HttpResponse<String> r = setter().postFiles(
                        "/import",
                        Map.of(),
                        Map.of("routes.xlsx", utf8(HEAD + "Quarry Loft,Cave,Q9,2026-11-20,boulder,V3\n")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("routes.xlsx", "is not an XLSX workbook");
        HttpResponse<String> bin =
                setter().postFiles("/import", Map.of(), Map.of("routes.csv", new byte[] {0x50, 0, 1, 2}));
        assertThat(bin.body()).contains("holds binary data");
    }

    @Test
    void dryRunsFirstThenImportsTheFilesItChecked() throws Exception {
        long before = routes();
        Client c = setter();
        HttpResponse<String> checked = c.postFiles(
                "/import", Map.of(), Map.of("routes.csv", utf8(HEAD + "Quarry Loft,Slab,S1,2026-11-21,boulder,V2\n")));
        assertThat(checked.statusCode()).isEqualTo(200);
        assertThat(checked.body()).contains("this is what the import would do", "1 new routes", "New walls: Slab");
        assertThat(routes()).isEqualTo(before);
        Matcher m = Pattern.compile("name=\"token\" value=\"([^\"]+)\"").matcher(checked.body());
        assertThat(m.find()).isTrue();
        HttpResponse<String> done = c.postWithToken("/import/confirm", Map.of("token", m.group(1)));
        assertThat(done.statusCode()).isEqualTo(200);
        assertThat(done.body()).contains("Imported", "1 new routes");
        assertThat(routes()).isEqualTo(before + 1);
        // The same checked files cannot be imported twice.
        assertThat(c.postWithToken("/import/confirm", Map.of("token", m.group(1)))
                        .statusCode())
                .isEqualTo(409);
    }

    @Test
    void refusesAViewerAndAnOversizeUpload() throws Exception {
        Client viewer = new Client(fx.base());
        viewer.signIn("vik", WebFixture.PASSWORD);
        viewer.get("/");
        HttpResponse<String> refused = viewer.postFiles(
                "/import", Map.of(), Map.of("routes.csv", utf8(HEAD + "Quarry Loft,Cave,Q9,2026-11-20,boulder,V3\n")));
        assertThat(refused.statusCode()).isEqualTo(403);
        assertThat(viewer.get("/import").statusCode()).isEqualTo(403);

        long before = routes();
        byte[] big = new byte[200 * 1024];
        java.util.Arrays.fill(big, (byte) 'a');
        HttpResponse<String> tooBig = setter().postFiles("/import", Map.of(), Map.of("routes.csv", big));
        assertThat(tooBig.statusCode()).isEqualTo(413);
        assertThat(tooBig.body()).doesNotContain("Exception");
        assertThat(routes()).isEqualTo(before);
    }
}
