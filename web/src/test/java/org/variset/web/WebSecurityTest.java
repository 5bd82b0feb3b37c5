package org.variset.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** Each security boundary of the web workspace, at the HTTP level, on an invented gym. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class WebSecurityTest {
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

    private Client client() {
        return new Client(fx.base());
    }

    @Test
    void listensOnLoopbackByDefault() {
        assertThat(fx.server.address()).startsWith("http://127.0.0.1:");
    }

    @Test
    void sendsEveryPageButSignInAndStaticFilesToSignIn() throws Exception {
        Client c = client();
        for (String path : new String[] {"/", "/search?q=dyno", "/reset?gym=Quarry+Loft&label=x", "/route?id=1"}) {
            HttpResponse<String> r = c.get(path);
            assertThat(r.statusCode()).as(path).isEqualTo(302);
            assertThat(r.headers().firstValue("Location").orElse("")).as(path).startsWith("/signin?next=");
        }
        assertThat(c.get("/signin").statusCode()).isEqualTo(200);
        assertThat(c.get("/static/variset.css").statusCode()).isEqualTo(200);
    }

    @Test
    void signsInWithAnHttpOnlyStrictCookieAndOut() throws Exception {
        Client c = client();
        HttpResponse<String> in = c.signIn("vik", WebFixture.PASSWORD);
        assertThat(in.statusCode()).isEqualTo(302);
        String cookie = in.headers().allValues("Set-Cookie").stream()
                .filter(h -> h.startsWith("variset_session="))
                .findFirst()
                .orElseThrow();
        assertThat(cookie).contains("HttpOnly", "SameSite=Strict").doesNotContain("Secure");
        HttpResponse<String> home = c.get("/");
        assertThat(home.statusCode()).isEqualTo(200);
        assertThat(home.body()).contains("Quarry Loft", "vik · Viewer");

        HttpResponse<String> out = c.postWithToken("/signout", Map.of());
        assertThat(out.statusCode()).isEqualTo(302);
        assertThat(c.get("/").statusCode()).isEqualTo(302);
    }

    @Test
    void refusesAWrongPasswordAndThenRateLimitsTheName() throws Exception {
        Client c = client();
        HttpResponse<String> wrong = c.signIn("sol", "not the password at all");
        assertThat(wrong.statusCode()).isEqualTo(401);
        assertThat(wrong.body()).contains("do not match an account");
        for (int i = 1; i < WebServer.SIGN_IN_FAILURES; i++) {
            assertThat(c.signIn("sol", "not the password at all").statusCode()).isEqualTo(401);
        }
        // Now even the right password waits: the limit is checked before any password.
        HttpResponse<String> limited = c.signIn("sol", WebFixture.PASSWORD);
        assertThat(limited.statusCode()).isEqualTo(429);
        assertThat(limited.headers().firstValue("Retry-After")).isPresent();
        assertThat(limited.body()).contains("Too many failed sign-ins");
        // Another name from another client still signs in... but this client's address is limited too.
        assertThat(client().signIn("hana", WebFixture.PASSWORD).statusCode()).isEqualTo(429);
        fx.clock.advance(WebServer.SIGN_IN_WINDOW.plusSeconds(1));
        assertThat(client().signIn("sol", WebFixture.PASSWORD).statusCode()).isEqualTo(302);
    }

    @Test
    void refusesASignInFormWithoutItsToken() throws Exception {
        Client c = client();
        c.get("/signin");
        HttpResponse<String> r = c.post("/signin", Map.of("name", "vik", "password", WebFixture.PASSWORD));
        assertThat(r.statusCode()).isEqualTo(403);
        assertThat(r.body()).contains("security token");
    }

    @Test
    void refusesAStateChangeWithoutItsCsrfTokenAndChangesNothing() throws Exception {
        Client c = client();
        c.signIn("hana", WebFixture.PASSWORD);
        long id = fx.routeId("Q3");
        HttpResponse<String> noToken = c.post("/route/remove", Map.of("id", Long.toString(id)));
        assertThat(noToken.statusCode()).isEqualTo(403);
        assertThat(noToken.body()).contains("security token", "Nothing was changed");
        HttpResponse<String> wrongToken = c.post("/route/remove", Map.of("id", Long.toString(id), "csrf", "guess"));
        assertThat(wrongToken.statusCode()).isEqualTo(403);
        assertThat(fx.routeId("Q3")).isEqualTo(id);
        HttpResponse<String> signOut = c.post("/signout", Map.of());
        assertThat(signOut.statusCode()).isEqualTo(403);
        assertThat(c.get("/").statusCode()).isEqualTo(200);
    }

    @Test
    void endsAnIdleSessionAndSendsItBackToSignIn() throws Exception {
        Client c = client();
        c.signIn("vik", WebFixture.PASSWORD);
        assertThat(c.get("/").statusCode()).isEqualTo(200);
        fx.clock.advance(Duration.ofMinutes(31));
        HttpResponse<String> r = c.get("/");
        assertThat(r.statusCode()).isEqualTo(302);
        assertThat(r.headers().firstValue("Location").orElse("")).contains("/signin", "expired");
        assertThat(c.get("/signin?expired").body()).contains("Your session ended");
    }

    @Test
    void neverRedirectsToAnotherSite() throws Exception {
        Client c = client();
        c.get("/signin");
        HttpResponse<String> r = c.postWithToken(
                "/signin", Map.of("name", "vik", "password", WebFixture.PASSWORD, "next", "//elsewhere.example/x"));
        assertThat(r.headers().firstValue("Location")).contains("/");
    }

    @Test
    void printsMarkupInANameAsText() throws Exception {
        Client c = client();
        c.signIn("vik", WebFixture.PASSWORD);
        String route = c.get("/route?id=" + fx.routeId(WebFixture.SCRIPT_NAME)).body();
        assertThat(route).doesNotContain("<script>alert(1)</script>").contains("&lt;script&gt;alert(1)&lt;/script&gt;");
        String search = c.get("/search?q=dyno").body();
        assertThat(search).doesNotContain("<script>alert(1)").contains("&lt;script&gt;alert(1)");
    }

    @Test
    void setsHeadersThatKeepPagesOutOfFramesAndScriptsToThisSite() throws Exception {
        HttpResponse<String> r = client().get("/signin");
        assertThat(r.headers().firstValue("Content-Security-Policy").orElse(""))
                .contains("script-src 'self'", "frame-ancestors 'none'");
        assertThat(r.headers().firstValue("X-Content-Type-Options")).contains("nosniff");
        assertThat(r.headers().firstValue("Content-Type").orElse("")).contains("charset=utf-8");
    }

    @Test
    void keepsAnAccountLimitedToAGymOutOfTheOthers() throws Exception {
        Client c = client();
        c.signIn("kilnonly", WebFixture.PASSWORD);
        String home = c.get("/").body();
        assertThat(home).contains("Kiln Yard").doesNotContain("Quarry Loft");
        assertThat(c.get("/reset?gym=Quarry+Loft&label=Cave+2026-11-02").statusCode())
                .isEqualTo(403);
        assertThat(c.get("/route?id=" + fx.routeId("Q1")).statusCode()).isEqualTo(403);
        assertThat(c.get("/search?q=heel").body()).doesNotContain("Q1 ·");
    }
}
