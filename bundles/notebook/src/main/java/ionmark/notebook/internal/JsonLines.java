package ionmark.notebook.internal;

import java.io.IOException;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;

/**
 * The line on which each value of a JSON text starts, so that a problem reported with a JSON path
 * ({@code $.groups[3].smarts}) can point at its line in the raw editor.
 */
final class JsonLines {
    private static final JsonFactory FACTORY = new JsonFactory();
    private static final Pattern STEP = Pattern.compile("\\.([^.\\[]+)|\\[(\\d+)]");
    private static final Pattern SYNTAX = Pattern.compile("at line (\\d+)");
    private final Map<String, Integer> lines = new HashMap<>();

    private JsonLines() {
    }

    /** Reads as much of the text as parses; a syntax error stops the map where it happened. */
    static JsonLines of(String text) {
        JsonLines l = new JsonLines();
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken t;
            while ((t = p.nextToken()) != null) {
                if (t == JsonToken.FIELD_NAME) {
                    continue;
                }
                String pointer = p.getParsingContext().pathAsPointer().toString();
                l.lines.putIfAbsent(pointer, p.currentTokenLocation().getLineNr());
            }
        } catch (IOException e) {
            // keep what was read
        }
        return l;
    }

    /**
     * The line of a problem: its JSON path's value, or the nearest enclosing value's, or the line a
     * syntax error message names; 0 when unknown.
     */
    int lineOf(String path, String message) {
        Matcher s = SYNTAX.matcher(message == null ? "" : message);
        if (s.find()) {
            return Integer.parseInt(s.group(1));
        }
        StringBuilder pointer = new StringBuilder();
        int best = lines.getOrDefault("", 0);
        Matcher m = STEP.matcher(path == null ? "" : path);
        while (m.find()) {
            pointer.append('/').append(m.group(1) != null ? m.group(1) : m.group(2));
            Integer line = lines.get(pointer.toString());
            if (line == null) {
                break;
            }
            best = line;
        }
        return best;
    }
}
