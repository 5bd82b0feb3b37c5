package org.variset.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Every route for every role: what each may open, and what each is refused. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class WebRolesTest {
    @TempDir
    static Path dir;

    private WebFixture fx;

    @BeforeAll
    void start() throws Exception {
        fx = WebFixture.start(dir);
    }

    @AfterAll
    void stop() {
        fx.close();
    }

    @ParameterizedTest(name = "{0} GET {1} -> {2}")
    @CsvSource({
        "vik,  /, 200",
        "vik,  /wall?gym=Quarry+Loft&wall=Cave, 200",
        "vik,  /reset?gym=Quarry+Loft&label=Cave+2026-11-02, 200",
        "vik,  /reset.pdf?gym=Quarry+Loft&label=Cave+2026-11-02, 200",
        "vik,  /route?id=ROUTE, 200",
        "vik,  /search?q=heel+hook, 200",
        "vik,  /route/remove?id=ROUTE, 403",
        "sol,  /route/remove?id=ROUTE, 403",
        "hana, /route/remove?id=ROUTE, 200",
        "ada,  /route/remove?id=ROUTE, 200",
        "vik,  /import, 403",
        "sol,  /import, 200",
        "kilnonly, /import, 200",
        "vik,  /no/such/page, 404",
        "vik,  /reset?gym=Quarry+Loft&label=Nope, 400",
        "vik,  /reset?gym=Quarry+Loft, 400",
        "vik,  /route?id=abc, 400",
        "vik,  /route?id=999999, 404",
    })
    void opensWhatTheRoleMay(String account, String path, int status) throws Exception {
        Client c = new Client(fx.base());
        c.signIn(account, WebFixture.PASSWORD);
        HttpResponse<String> r = c.get(path.replace("ROUTE", Long.toString(fx.routeId("Q1"))));
        assertThat(r.statusCode()).as(r.body()).isEqualTo(status);
        assertThat(r.body()).doesNotContain("Exception", "at org.");
    }

    @ParameterizedTest(name = "{0} removes a route -> {1}")
    @CsvSource({"vik, 403", "sol, 403", "hana, 200"})
    void removesOnlyForHeadSettersAndUp(String account, int status) throws Exception {
        Client c = new Client(fx.base());
        c.signIn(account, WebFixture.PASSWORD);
        String label = "Q3";
        long id = fx.routeId(label);
        if (id < 0) {
            return; // removed by an earlier row
        }
        c.get("/route?id=" + id);
        HttpResponse<String> r = c.postWithToken("/route/remove", Map.of("id", Long.toString(id)));
        assertThat(r.statusCode()).isEqualTo(status);
        if (status == 403) {
            assertThat(fx.routeId(label)).as("the archive is unchanged").isEqualTo(id);
            assertThat(r.body()).contains("Nothing was changed");
        } else {
            assertThat(r.body()).contains("Removed Q3");
            assertThat(fx.routeId(label)).isEqualTo(-1);
        }
    }
}
