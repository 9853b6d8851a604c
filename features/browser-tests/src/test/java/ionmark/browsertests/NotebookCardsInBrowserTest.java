package ionmark.browsertests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

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
import org.openqa.selenium.Dimension;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The notebook's cards and the host's basics in chromium: the work-up demo entry (reaction components, implied
 * pH, the work-up answer, a molfile drawn on its own atoms), who may edit, a new entry with its history, the
 * quick check. Screenshots at 1,400 px and at a narrow width go to target/screenshots.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class NotebookCardsInBrowserTest {
    static RunningApp app;
    static WebDriver browser;
    static String base;
    static Path shots;

    @TempDir
    static Path workspace;

    @BeforeAll
    static void start() throws Exception {
        boolean present = Files.isExecutable(NotebookInBrowserTest.CHROMIUM) && Files.isExecutable(NotebookInBrowserTest.DRIVER);
        if (System.getenv("CI") != null) {
            assertTrue(present, "CI must install chromium and chromium-driver (see .ci/run)");
        }
        assumeTrue(present, "chromium and chromedriver are not installed: browser test skipped");
        app = RunningApp.start(workspace, "cards", Integer.getInteger("ionmark.browser.port", 0));
        base = app.base;
        ChromeOptions o = PolicyViolations.recordConsole(new ChromeOptions());
        o.setBinary(NotebookInBrowserTest.CHROMIUM.toFile());
        o.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--window-size=1400,1000", "--user-data-dir=" + Files.createTempDirectory("chromium"));
        browser = new ChromeDriver(new ChromeDriverService.Builder()
                .usingDriverExecutable(NotebookInBrowserTest.DRIVER.toFile()).build(), o);
        shots = Path.of(System.getProperty("ionmark.screenshots", "target/screenshots"));
        Files.createDirectories(shots);
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

    /** A screenshot of the whole page height at a given width. */
    static void fullShot(String name, int width) throws IOException {
        long h = (Long) ((org.openqa.selenium.JavascriptExecutor) browser)
                .executeScript("return document.documentElement.scrollHeight");
        browser.manage().window().setSize(new Dimension(width, (int) Math.min(h + 120, 9000)));
        shot(name);
        browser.manage().window().setSize(new Dimension(1400, 1000));
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
    void aVisitorCannotEditAndSeesAStyledPage() throws IOException {
        browser.get(base + "/entry/07-coupling-workup/edit");
        String page = browser.findElement(By.tagName("main")).getText();
        assertTrue(page.contains("403") && page.contains("Editing needs a signed-in user"), page);
        shot("visitor-403");
        browser.get(base + "/entry/no-such-entry");
        assertTrue(browser.findElement(By.tagName("main")).getText().contains("There is no such entry"));
        shot("not-found-404");
    }

    @Test
    @Order(2)
    void theWorkupEntryAnswersWhereEachStructureGoes() throws IOException {
        browser.get(base + "/entry/07-coupling-workup");
        // right after start the page may say that annotations are loading and reload itself
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> d.findElements(By.cssSelector(".im-card")).size() >= 8);
        List<WebElement> cards = browser.findElements(By.cssSelector(".im-card"));
        assertEquals(8, cards.size(), "three reaction components, three work-up structures, one molfile, one name "
                + "(the compounds that are also drawn get no card from their names)");
        String all = browser.findElement(By.tagName("main")).getText();
        // benzylamine (pKa 9.34, CRC) in the 1 M HCl wash: charged, stays in the aqueous layer
        String amine = cards.get(3).getText();
        assertTrue(amine.contains("implied by") && amine.contains("1 M HCl"), amine);
        assertTrue(amine.contains("in the aqueous layer (EtOAc/water 1:1"), amine);
        // phenylacetic acid (pKa 4.31, CRC) in sat. NaHCO3 (pH ≈ 8.3): charged, in water
        String acid = cards.get(4).getText();
        assertTrue(acid.contains("pH ≈ 8.3, implied by") && acid.contains("implied"), acid);
        assertTrue(acid.contains("in the aqueous layer"), acid);
        assertTrue(all.contains("pH ranges that separate the structures of this entry"), all);
        assertTrue(all.contains("partition estimates are for planning"), all);
        assertFalse(all.contains("-0.00"), "no negative zero");
        // the molfile card: the carboxyl O is the acid (■) and the amine N the base (●), atoms counted from 1
        String molfile = cards.get(6).getText();
        assertTrue(molfile.contains("PBS"), molfile);
        assertTrue(molfile.contains("■ acid") && molfile.contains("● base"), molfile);
        assertTrue(java.util.regex.Pattern.compile("\\bO1\\b").matcher(molfile).find(), "the carboxyl OH is atom 1 of the molfile: " + molfile);
        assertTrue(molfile.contains("N10"), "the amine N is atom 10 of the molfile: " + molfile);
        // the second standard is named only: its structure is read from the name and the card says so
        String named = cards.get(7).getText();
        assertTrue(named.toLowerCase(java.util.Locale.ROOT).contains("structure from the name") && named.contains("4-(aminomethyl)benzoic acid"), named);
        assertTrue(named.contains("Structure read from the chemical name"), named);
        fullShot("workup-entry-1400", 1400);
        fullShot("workup-entry-narrow", 600);
    }

    @Test
    @Order(3)
    void anEditorCreatesAnEntryEditsItBesideThePreviewAndItsHistoryIsKept() throws IOException {
        signInHere();
        browser.get(base + "/");
        browser.findElement(By.id("new-entry")).click();
        browser.findElement(By.name("title")).sendKeys("Extraction of batch Q-3");
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(d -> d.getCurrentUrl().endsWith("/edit"));
        WebElement text = browser.findElement(By.id("text"));
        text.sendKeys("Washed with 0,1 % TFA at 37 C.\n\n```smiles ph=20\nCCN\n```\n\n```smiles\nCC(=O)O\n```\n");
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(d -> d.findElement(By.id("preview")).getText()
                .contains("outside pH −2…16"));
        String preview = browser.findElement(By.id("preview")).getText();
        assertTrue(preview.contains("implied by"), "the other card is annotated: " + preview);
        WebElement editor = browser.findElement(By.id("text"));
        WebElement pane = browser.findElement(By.id("preview"));
        assertTrue(pane.getLocation().getX() > editor.getLocation().getX() + editor.getSize().getWidth() - 5,
                "the preview is beside the editor");
        shot("editor-beside-preview");
        browser.findElement(By.cssSelector(".im-editpane button[type=submit]")).click();
        // the save answers with a redirect to the entry; leaving before it arrives could cancel the save
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(d -> d.getCurrentUrl().endsWith("/entry/extraction-of-batch-q-3"));
        browser.get(base + "/?q=Q-3");
        String list = browser.findElement(By.tagName("main")).getText();
        assertTrue(list.contains("Extraction of batch Q-3") && list.contains("admin"), list);
        shot("entry-list-search");
        browser.get(base + "/entry/extraction-of-batch-q-3/history");
        assertEquals(2, browser.findElements(By.cssSelector(".im-entries tbody tr")).size(), "created, then saved");
    }

    @Test
    @Order(4)
    void quickCheckDefaultsToPh74AndNamesABadField() throws IOException {
        browser.get(base + "/panel/quick-check");
        assertEquals("7.4", browser.findElement(By.name("ph")).getAttribute("value"));
        browser.get(base + "/panel/quick-check?structure=NCC(%3DO)O&ph=7.4&temp=hot");
        String page = browser.findElement(By.tagName("main")).getText();
        assertTrue(page.contains("temperature must be a number from 0 to 100 °C, not 'hot'"), page);
        browser.get(base + "/panel/quick-check?structure=NCC(%3DO)O&ph=7.4");
        assertTrue(browser.findElement(By.tagName("main")).getText().contains("zwitterion"));
        fullShot("quick-check-glycine", 1400);
    }

    @Test
    @Order(5)
    void aLargeMolfileGoesThroughTheQuickCheckAndANarrowPageStacksTheSiteTable() throws IOException {
        // a V2000 molfile of docosanoic acid padded with data items to about 12 kB, more than a URL carries (while
        // the form was sent by GET, the request was refused for its length)
        String mol = chainAcid(22, 12_000);
        assertTrue(mol.length() > 10_000);
        browser.get(base + "/panel/quick-check");
        WebElement area = browser.findElement(By.id("structure"));
        ((org.openqa.selenium.JavascriptExecutor) browser).executeScript("arguments[0].value = arguments[1];", area,
                mol);
        browser.findElement(By.cssSelector("#quick button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(d -> !d.findElements(By.cssSelector(".im-sites"))
                .isEmpty() || d.findElement(By.tagName("body")).getText().contains("414"));
        String page = browser.findElement(By.tagName("main")).getText();
        assertFalse(page.contains("414"), page);
        assertEquals(1, browser.findElements(By.cssSelector(".im-sites tbody tr")).size(), page);
        // at 600 px the site table stacks its cells instead of running past the card's edge
        browser.manage().window().setSize(new Dimension(600, 1000));
        try {
            Object over = ((org.openqa.selenium.JavascriptExecutor) browser).executeScript(
                    "const t=document.querySelector('.im-sites');return t.scrollWidth - t.parentElement.clientWidth;");
            assertTrue(((Number) over).intValue() <= 0, "the site table is " + over + " px wider than its card");
            shot("quick-check-large-molfile-600");
        } finally {
            browser.manage().window().setSize(new Dimension(1400, 1000));
        }
    }

    /** An unbranched C(n) carboxylic acid as a V2000 molfile, with a comment line padding it to about {@code size}. */
    static String chainAcid(int carbons, int size) {
        StringBuilder sb = new StringBuilder("chain acid\n  ionmark-test\n").append("x".repeat(Math.min(79, size)))
                .append('\n');
        int atoms = carbons + 2;
        sb.append(String.format(java.util.Locale.ROOT, "%3d%3d  0  0  0  0  0  0  0  0999 V2000%n", atoms, atoms - 1));
        for (int i = 0; i < carbons; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "%10.4f%10.4f%10.4f C   0  0  0  0  0  0  0  0  0  0  0  0%n",
                    i * 1.3, (i % 2) * 0.75, 0.0));
        }
        sb.append(String.format(java.util.Locale.ROOT, "%10.4f%10.4f%10.4f O   0  0  0  0  0  0  0  0  0  0  0  0%n",
                carbons * 1.3, 0.0, 0.0));
        sb.append(String.format(java.util.Locale.ROOT, "%10.4f%10.4f%10.4f O   0  0  0  0  0  0  0  0  0  0  0  0%n",
                (carbons - 1) * 1.3, 1.5, 0.0));
        for (int i = 1; i < carbons; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "%3d%3d  1  0%n", i, i + 1));
        }
        sb.append(String.format(java.util.Locale.ROOT, "%3d%3d  1  0%n", carbons, carbons + 1));
        sb.append(String.format(java.util.Locale.ROOT, "%3d%3d  2  0%n", carbons, carbons + 2));
        sb.append("M  END\n");
        while (sb.length() < size) {
            sb.append("> <COMMENT>\n").append("padding for size ".repeat(4)).append("\n\n");
        }
        return sb.append("$$$$\n").toString();
    }

    private static void signInHere() {
        browser.get(base + "/signin");
        browser.findElement(By.name("user")).sendKeys("admin");
        try {
            browser.findElement(By.name("password")).sendKeys(Files.readString(workspace.resolve(
                    ".ionmark/admin-password.txt")).strip());
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(d -> d.getPageSource().contains("Sign out"));
    }
}
