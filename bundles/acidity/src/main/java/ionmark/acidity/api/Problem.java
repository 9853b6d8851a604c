package ionmark.acidity.api;

/**
 * One finding of the table validator.
 *
 * @param severity error (the table cannot be used) or warning
 * @param path     JSON path of the offending value, for example {@code $.groups[12].smarts}
 * @param message  plain words for a curator
 */
public record Problem(Severity severity, String path, String message) {
    public enum Severity { ERROR, WARNING }

    @Override
    public String toString() {
        return severity.name().toLowerCase(java.util.Locale.ROOT) + " " + path + ": " + message;
    }
}
