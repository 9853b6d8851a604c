package ionmark.browsertests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInfo;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * An admin chemist curates the shared table in chromium, every task through the page's forms:
 * find records, add a reference and a measured compound, change a class value with its source,
 * review the regression report, publish, survive someone else's publish by rebasing, roll back, read
 * the audit trail, and find a raw-JSON error by its line. Screenshots go to target/screenshots.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class TableCurationInBrowserTest {
    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    static final Path DRIVER = Path.of("/usr/bin/chromedriver");
    static RunningApp app;
    static WebDriver browser;
    static String base;
    static Path shots;

    @TempDir
    static Path workspace;
    /** The version a new store starts at: the shipped table's own number. */
    static int seed;

    @BeforeAll
    static void start() throws Exception {
        boolean present = Files.isExecutable(CHROMIUM) && Files.isExecutable(DRIVER);
        if (System.getenv("CI") != null) {
            assertTrue(present, "CI must install chromium and chromium-driver (see .ci/run)");
        }
        assumeTrue(present, "chromium and chromedriver are not installed: browser test skipped");
        app = RunningApp.start(workspace, "curation-app");
        base = app.base;
        ChromeOptions o = PolicyViolations.recordConsole(new ChromeOptions());
        o.setBinary(CHROMIUM.toFile());
        o.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--window-size=1400,2400",
                "--user-data-dir=" + Files.createTempDirectory("chromium"));
        browser = new ChromeDriver(new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile()).build(), o);
        shots = Path.of(System.getProperty("ionmark.screenshots", "target/screenshots"));
        Files.createDirectories(shots);
        long deadline = System.currentTimeMillis() + 60_000;
        do { // the admin page registers once the table store has opened
            browser.get(base + "/signin");
        } while (!browser.getPageSource().contains("Sign in") && System.currentTimeMillis() < deadline);
        String password = Files.readString(workspace.resolve(".ionmark/admin-password.txt")).strip();
        browser.findElement(By.name("user")).sendKeys("admin");
        browser.findElement(By.name("password")).sendKeys(password);
        browser.findElement(By.cssSelector("form[action='/signin'] button")).click();
        // the department's entries as a chemist opens them: the report of affected entries covers what was annotated
        browser.get(base + "/entry/04-buffer-preparation");
        browser.get(base + "/entry/05-assay-ph74");
        while (System.currentTimeMillis() < deadline) {
            browser.get(base + "/admin/table");
            if (!browser.findElements(By.id("search-form")).isEmpty()) {
                Matcher v = Pattern.compile("based on v(\\d+)").matcher(browser.getPageSource());
                assertTrue(v.find(), "the page names the version the draft is based on");
                seed = Integer.parseInt(v.group(1));
                return;
            }
            Thread.sleep(500);
        }
        throw new AssertionError("the table admin page did not come up: " + browser.getPageSource());
    }

    @AfterAll
    static void stop() {
        if (browser != null) {
            browser.quit();
        }
        if (app != null) {
            app.close();
        }
    }

    static void shot(String name) throws IOException {
        Files.write(shots.resolve(name + ".png"), ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES));
    }

    static String text(String id) {
        return browser.findElement(By.id(id)).getText();
    }

    static void fill(String form, String name, String value) {
        WebElement e = browser.findElement(By.cssSelector("#" + form + " [name='" + name + "']"));
        e.clear();
        e.sendKeys(value);
    }

    static void press(String form, String action) {
        browser.findElement(By.cssSelector("#" + form + " button[value='" + action + "']")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> !d.findElements(By.id("history")).isEmpty());
    }

    /** Every page a test visited ran under the strict page policy without a blocked script or style. */
    @AfterEach
    void noPagePolicyViolations(TestInfo test) {
        if (browser != null) {
            PolicyViolations.assertNone(browser, test.getDisplayName());
        }
    }

    @Test
    @Order(1)
    void findsRecordsByNameAndByStructure() throws IOException {
        fill("search-form", "q", "carboxylic-aromatic");
        press("search-form", "search");
        assertTrue(text("search-results").contains("carboxylic-aromatic-ortho-hydroxy"), text("search-results"));
        fill("search-form", "structure", "OC(=O)c1ccccc1O");
        press("search-form", "search-structure");
        // salicylic acid: a carboxylic acid and a phenol site, each named by its class
        String found = text("perceived-sites");
        assertTrue(found.contains("carboxylic-aromatic-ortho-hydroxy") && found.contains("phenol"), found);
        shot("curation-search-structure");
    }

    @Test
    @Order(2)
    void addsAReferenceThroughTheForm() throws IOException {
        fill("reference-form", "refid", "albert1984");
        fill("reference-form", "citation", "Albert, A.; Serjeant, E. P. The Determination of Ionization Constants, "
                + "3rd ed.; Chapman and Hall, London, 1984.");
        press("reference-form", "reference");
        assertTrue(text("task-notes").contains("Added reference albert1984"), text("task-notes"));
        assertTrue(browser.findElement(By.cssSelector("#measured-form select[name='source']")).getText()
                .contains("albert1984"));
    }

    @Test
    @Order(3)
    void aValueNoPerceivedSiteCanTakeIsRefused() throws IOException {
        // phenol has one titratable site; two values cannot both be its
        fill("measured-form", "name", "phenol test");
        fill("measured-form", "smiles", "Oc1ccccc1");
        fill("measured-form", "pka", "2.0, 9.99");
        new Select(browser.findElement(By.cssSelector("#measured-form select[name='source']"))).selectByValue("crc");
        press("measured-form", "measured");
        assertTrue(text("task-errors").contains("no site can take"), text("task-errors"));
        shot("curation-measured-refused");
    }

    @Test
    @Order(4)
    void addsAMeasuredCompoundWithItsSitesShown() throws IOException {
        // 4-chlorophenol 9.41 (CRC Handbook, dissociation constants of organic acids, from memory)
        fill("measured-form", "name", "4-chlorophenol");
        fill("measured-form", "id", "");
        fill("measured-form", "smiles", "Oc1ccc(Cl)cc1");
        fill("measured-form", "pka", "9.41");
        fill("measured-form", "method", "potentiometry");
        new Select(browser.findElement(By.cssSelector("#measured-form select[name='source']"))).selectByValue("albert1984");
        press("measured-form", "measured-sites");
        assertTrue(text("perceived-sites").contains("phenol"), text("perceived-sites"));
        assertTrue(text("task-notes").contains("pKa 9.41 would go to"), text("task-notes"));
        press("measured-form", "measured");
        assertTrue(text("task-notes").contains("Added measured compound 4-chlorophenol"), text("task-notes"));
        assertTrue(text("draft-changes").contains("added measured 4-chlorophenol"), text("draft-changes"));
        shot("curation-measured-added");
    }

    @Test
    @Order(5)
    void changesAClassValueOnlyWithItsSource() throws IOException {
        fill("search-form", "q", "amine-primary");
        press("search-form", "search");
        browser.findElement(By.cssSelector("#search-results button[data-record='amine-primary']")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> !d.findElements(By.id("history")).isEmpty());
        assertEquals("amine-primary", new Select(browser.findElement(By.id("group"))).getFirstSelectedOption()
                .getAttribute("value"));
        assertTrue(text("class-form").contains("fitted by"), text("class-form"));
        // ethylamine 10.65 (CRC, from memory) as the class value, first without saying where it comes from
        fill("class-form", "pka", "10.65");
        press("class-form", "class-value");
        assertTrue(text("task-errors").contains("Choose the source"), text("task-errors"));
        fill("class-form", "pka", "10.65");
        new Select(browser.findElement(By.cssSelector("#class-form select[name='source']"))).selectByValue("crc");
        press("class-form", "class-value");
        assertTrue(text("task-notes").contains("amine-primary pka"), text("task-notes"));
        String changes = text("draft-changes");
        assertTrue(changes.contains("groups amine-primary · pka") && changes.contains("\"pka\":\"crc\""), changes);
        shot("curation-class-value");
    }

    @Test
    @Order(6)
    void reviewsTheRegressionAndPublishes() throws IOException {
        browser.findElement(By.id("check")).click();
        new WebDriverWait(browser, Duration.ofSeconds(120)).until(d -> !d.findElements(By.id("regression")).isEmpty());
        String summary = text("regression-summary");
        assertTrue(summary.contains("Reference set"), summary);
        WebElement table = browser.findElement(By.id("regression"));
        assertTrue(table.getText().contains("amine-primary"), "the classes-touched column names the class");
        table.findElement(By.xpath(".//th[text()='largest move']")).click();
        assertTrue(text("entries-heading").contains("Notebook entries that change"));
        Matcher seen = Pattern.compile("(\\d+) entries seen").matcher(text("entries-heading-block"));
        assertTrue(seen.find() && Integer.parseInt(seen.group(1)) >= 2, "the two entries opened are covered: "
                + text("entries-heading-block"));
        shot("curation-regression");
        fill("publish-form", "comment", "4-chlorophenol measured; primary amine value from the handbook");
        browser.findElement(By.id("publish")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> d.getPageSource().contains("Published v"));
        assertTrue(browser.getPageSource().contains("Published v" + (seed + 1)), browser.getPageSource());
    }

    @Test
    @Order(7)
    void aRefusedPublishKeepsTheDraftAndRebases() throws Exception {
        browser.get(base + "/admin/table");
        fill("reference-form", "refid", "perrin1965");
        fill("reference-form", "citation", "Perrin, D. D. Dissociation Constants of Organic Bases in Aqueous Solution; "
                + "Butterworths, London, 1965.");
        press("reference-form", "reference");
        // meanwhile someone else publishes (a rollback to the seed version from another window)
        String cookie = browser.manage().getCookies().stream().map(c -> c.getName() + "=" + c.getValue())
                .collect(Collectors.joining("; "));
        HttpResponse<String> page = http("GET", "/admin/table", cookie, Map.of());
        Matcher m = Pattern.compile("name=\"token\" value=\"([0-9a-f]+)\"").matcher(page.body());
        assertTrue(m.find());
        HttpResponse<String> other = http("POST", "/admin/table", cookie, Map.of("token", m.group(1), "action",
                "rollback", "to", String.valueOf(seed), "base", String.valueOf(seed + 1), "comment", "back to the shipped table"));
        assertTrue(other.body().contains("Published v" + (seed + 2)), other.body());

        fill("publish-form", "comment", "second Perrin compilation cited");
        browser.findElement(By.id("publish")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> !d.findElements(By.id("history")).isEmpty());
        assertTrue(text("conflict").contains("Not published"), text("conflict"));
        assertTrue(text("their-changes").contains("removed measured 4-chlorophenol"), text("their-changes"));
        assertTrue(text("my-changes").contains("added references perrin1965"), text("my-changes"));
        assertTrue(text("draft-changes").contains("perrin1965"), "the draft is kept");
        shot("curation-conflict");
        browser.findElement(By.id("rebase")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> !d.findElements(By.id("rebased")).isEmpty());
        assertTrue(text("rebase-applied").contains("perrin1965"), text("rebase-applied"));
        fill("publish-form", "comment", "second Perrin compilation cited");
        browser.findElement(By.id("publish")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> d.getPageSource().contains("Published v"));
        assertTrue(browser.getPageSource().contains("Published v" + (seed + 3)), browser.getPageSource());
        shot("curation-rebased-published");
    }

    @Test
    @Order(8)
    void rollsBackFromTheHistoryAndReadsTheAudit() throws IOException {
        WebElement row = browser.findElement(By.xpath("//table[@id='history']//tr[td[starts-with(normalize-space(.),'v" + (seed + 1) + " ')]]"));
        row.findElement(By.name("comment")).sendKeys("measured chlorophenol wanted back");
        row.findElement(By.cssSelector("button[value='rollback']")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> d.getPageSource().contains("with the content of v" + (seed + 1)));
        assertTrue(browser.getPageSource().contains("Published v" + (seed + 4)), browser.getPageSource());
        browser.findElement(By.id("audit-link")).click();
        String audit = text("audit-table");
        assertTrue(audit.contains("rollback") && audit.contains("measured chlorophenol wanted back"), audit);
        assertTrue(audit.matches("(?s).*\\d{1,2} [A-Z][a-z]{2} \\d{4}, \\d{2}:\\d{2} UTC.*"), "readable times: " + audit);
        shot("curation-audit");
    }

    @Test
    @Order(9)
    void aRawJsonErrorLinksToItsLine() throws IOException {
        browser.get(base + "/admin/table");
        browser.findElement(By.cssSelector("#raw summary")).click();
        ((JavascriptExecutor) browser).executeScript("const d=document.getElementById('draft');"
                + "d.value=d.value.replace('[CX4:2][NX3;H2','[CX4:2][NX3;H2[');d.dispatchEvent(new Event('input'));");
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> !d.findElements(By.cssSelector("#live [data-line]"))
                .isEmpty());
        WebElement link = browser.findElement(By.cssSelector("#live li.im-error [data-line]"));
        int line = Integer.parseInt(link.getAttribute("data-line"));
        link.click();
        Object selected = ((JavascriptExecutor) browser).executeScript("const d=document.getElementById('draft');"
                + "return d.value.substring(d.selectionStart,d.selectionEnd);");
        assertTrue(String.valueOf(selected).contains("[NX3;H2["), "line " + line + " selected: " + selected);
        shot("curation-raw-error-line");
    }

    static HttpResponse<String> http(String method, String path, String cookie, Map<String, String> form)
            throws Exception {
        String body = form.entrySet().stream().map(e -> e.getKey() + "=" + URLEncoder.encode(e.getValue(),
                StandardCharsets.UTF_8)).collect(Collectors.joining("&"));
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base + path)).header("Cookie", cookie);
        if (method.equals("POST")) {
            b.header("Content-Type", "application/x-www-form-urlencoded").POST(HttpRequest.BodyPublishers.ofString(body));
        }
        return HttpClient.newHttpClient().send(b.build(), HttpResponse.BodyHandlers.ofString());
    }
}
