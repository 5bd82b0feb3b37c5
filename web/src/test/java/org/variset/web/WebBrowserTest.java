package org.variset.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * The workspace in a real headless Chromium (Debian's {@code chromium} and {@code chromium-driver} packages, which
 * {@code .ci/run} installs; nothing is downloaded). Without them the test is skipped, unless the environment variable
 * {@code VARISET_REQUIRE_BROWSER} is set (as {@code .ci/run} sets it), when their absence fails it. The screenshots it
 * takes land in {@code web/target/screenshots}; the README's are copied from there.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class WebBrowserTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path DRIVER = Path.of("/usr/bin/chromedriver");

    @TempDir
    static Path dir;

    private WebFixture fx;
    private WebDriver browser;

    @BeforeAll
    void start() throws Exception {
        boolean present = Files.isExecutable(CHROMIUM) && Files.isExecutable(DRIVER);
        if (System.getenv("VARISET_REQUIRE_BROWSER") != null) {
            assertThat(present)
                    .as("Debian's chromium and chromium-driver are installed")
                    .isTrue();
        }
        Assumptions.assumeTrue(present, "no /usr/bin/chromium and /usr/bin/chromedriver: browser tests skipped");
        fx = WebFixture.start(dir);
        ChromeOptions o = new ChromeOptions();
        o.setBinary(CHROMIUM.toFile());
        o.addArguments(
                "--headless",
                "--no-sandbox",
                "--disable-gpu",
                "--disable-quic",
                "--no-first-run",
                "--disable-background-networking",
                "--disable-component-update",
                "--disable-sync",
                "--disable-dev-shm-usage",
                "--user-data-dir=" + Files.createTempDirectory(dir, "chromium-profile"),
                "--window-size=1280,900");
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort()
                .build();
        browser = new ChromeDriver(service, o);
        browser.manage().timeouts().implicitlyWait(Duration.ofSeconds(5));
    }

    @AfterAll
    void stop() {
        if (browser != null) {
            browser.quit();
        }
        if (fx != null) {
            fx.close();
        }
    }

    private void signIn(String name) {
        browser.manage().deleteAllCookies();
        browser.get(fx.base() + "/signin");
        browser.findElement(By.id("name")).sendKeys(name);
        browser.findElement(By.id("password")).sendKeys(WebFixture.PASSWORD);
        browser.findElement(By.cssSelector("form.signin button")).click();
    }

    private void screenshot(String name) throws Exception {
        Path out = Path.of("target", "screenshots");
        Files.createDirectories(out);
        File shot = ((TakesScreenshot) browser).getScreenshotAs(OutputType.FILE);
        Files.copy(shot.toPath(), out.resolve(name), StandardCopyOption.REPLACE_EXISTING);
    }

    @Test
    void aViewerSignsInOpensAnAuditSearchesWithAFacetAndSignsOut() throws Exception {
        signIn("vik");
        assertThat(browser.findElement(By.tagName("h1")).getText()).isEqualTo("Overview");
        assertThat(browser.findElement(By.tagName("main")).getText()).contains("Quarry Loft", "Kiln Yard");
        screenshot("web-overview.png");

        browser.findElement(By.linkText("Cave")).click();
        browser.findElement(By.linkText("Cave 2026-11-02")).click();
        assertThat(browser.findElement(By.tagName("h1")).getText()).contains("Cave 2026-11-02");
        assertThat(browser.findElements(By.cssSelector("figure svg"))).isNotEmpty();
        assertThat(browser.findElement(By.cssSelector("a[download]")).getAttribute("href"))
                .contains("/reset.pdf?");
        screenshot("web-reset.png");

        browser.findElement(By.linkText("Search")).click();
        browser.findElement(By.id("q")).sendKeys("heel hook");
        browser.findElement(By.cssSelector("form.search button")).click();
        String all = browser.findElement(By.cssSelector(".results h2")).getText();
        assertThat(all).isEqualTo("2 routes match");
        browser.findElement(By.cssSelector(".facets"))
                .findElement(By.linkText("Ines Varga"))
                .click();
        assertThat(browser.findElement(By.cssSelector(".results h2")).getText()).isEqualTo("1 route matches");
        assertThat(browser.findElement(By.id("q")).getAttribute("value")).contains("setter:");

        browser.findElement(By.cssSelector("form.who button")).click();
        assertThat(browser.getCurrentUrl()).contains("/signin");
        browser.get(fx.base() + "/");
        assertThat(browser.getCurrentUrl()).contains("/signin?next=");
    }

    @Test
    void aRouteNamedWithMarkupShowsItAsText() throws Exception {
        signIn("vik");
        browser.get(fx.base() + "/route?id=" + fx.routeId(WebFixture.SCRIPT_NAME));
        assertThat(browser.findElement(By.tagName("h1")).getText()).startsWith(WebFixture.SCRIPT_NAME);
        assertThat(browser.findElements(By.cssSelector("main script"))).isEmpty();
    }

    @Test
    void aViewerIsRefusedARemovalAndTheArchiveIsUnchanged() throws Exception {
        signIn("vik");
        long id = fx.routeId("Q1");
        browser.get(fx.base() + "/route?id=" + id);
        assertThat(browser.findElements(By.linkText("Remove this route…"))).isEmpty();
        browser.get(fx.base() + "/route/remove?id=" + id);
        assertThat(browser.findElement(By.tagName("h1")).getText()).isEqualTo("Not for your role");
        assertThat(fx.routeId("Q1")).isEqualTo(id);
    }

    @Test
    void anUploadOfABadFileShowsTheLocatedProblemsAndChangesNothing() throws Exception {
        Path bad = dir.resolve("upload").resolve("routes.csv");
        Files.createDirectories(bad.getParent());
        Files.writeString(
                bad,
                "gym,wall,route,set_on,discipline,grade\n"
                        + "Quarry Loft,Cave,Q7,2026-11-20,boulder,V3\n"
                        + "Quarry Loft,Cave,Q8,2026-11-20,boulder,V99\n");
        signIn("sol");
        browser.findElement(By.linkText("Import")).click();
        browser.findElement(By.id("files")).sendKeys(bad.toAbsolutePath().toString());
        browser.findElement(By.cssSelector("form[enctype] button")).click();
        String problems = browser.findElement(By.cssSelector(".problems")).getText();
        assertThat(problems).contains("Nothing was imported", "routes.csv", "3", "grade");
        assertThat(fx.routeId("Q7")).isEqualTo(-1);
        assertThat(fx.routeId("Q8")).isEqualTo(-1);
        screenshot("web-import-problems.png");
    }

    @Test
    void anExpiredSessionGoesBackToSignIn() throws Exception {
        signIn("vik");
        assertThat(browser.findElement(By.tagName("h1")).getText()).isEqualTo("Overview");
        fx.clock.advance(Duration.ofHours(13));
        browser.get(fx.base() + "/search");
        assertThat(browser.getCurrentUrl()).contains("/signin", "expired");
        assertThat(browser.findElement(By.cssSelector("p.message")).getText()).contains("Your session ended");
    }

    @Test
    void fitsATabletAndAPhoneWithoutScrollingSideways() throws Exception {
        signIn("vik");
        for (Dimension d : new Dimension[] {new Dimension(820, 1180), new Dimension(390, 844)}) {
            browser.manage().window().setSize(d);
            browser.get(fx.base() + "/reset?gym=Quarry+Loft&label=Cave+2026-11-02");
            Object wide = ((JavascriptExecutor) browser)
                    .executeScript("return document.documentElement.scrollWidth <= window.innerWidth + 1;");
            assertThat(wide).as("no sideways scroll at " + d).isEqualTo(true);
        }
        browser.manage().window().setSize(new Dimension(1280, 900));
    }
}
