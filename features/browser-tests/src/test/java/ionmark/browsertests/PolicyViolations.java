package ionmark.browsertests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.logging.Level;

import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.logging.LoggingPreferences;

/**
 * Chromium reports every script or style the page policy blocks on its console ("Refused to execute inline
 * script", "Refused to apply inline style", "violates the following Content Security Policy directive"). The
 * browser tests collect the console through Selenium's log and fail when any such line appears.
 */
final class PolicyViolations {
    private PolicyViolations() {
    }

    /** Asks chromedriver to keep the browser console for {@link #assertNone}. */
    static ChromeOptions recordConsole(ChromeOptions o) {
        LoggingPreferences logs = new LoggingPreferences();
        logs.enable(LogType.BROWSER, Level.ALL);
        o.setCapability("goog:loggingPrefs", logs);
        return o;
    }

    /** The console lines since the last call that name the page policy. */
    static List<String> since(WebDriver browser) {
        return browser.manage().logs().get(LogType.BROWSER).getAll().stream().map(LogEntry::getMessage)
                .filter(m -> m.contains("Content Security Policy") || m.contains("Refused to")).toList();
    }

    static void assertNone(WebDriver browser, String where) {
        List<String> found = since(browser);
        assertTrue(found.isEmpty(), "page policy violations in the console (" + where + "): " + found);
    }
}
