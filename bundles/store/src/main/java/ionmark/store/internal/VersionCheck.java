package ionmark.store.internal;

import java.util.List;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;

/**
 * Checks a stored version before it is read or installed: the content must parse, its version block must name
 * the row's number and the row's hash, and the hash must be the SHA-256 of the content (the validator reports
 * a block hash that does not match the content). Anything else means the row was changed outside the store.
 */
final class VersionCheck {
    private VersionCheck() {
    }

    static AcidityTable verify(TableService tables, int number, String rowHash, String content) {
        ValidationReport r = tables.validate(content);
        if (r.table().isEmpty()) {
            throw refused(number, "its content does not parse (" + first(r) + ")");
        }
        AcidityTable t = r.table().get();
        if (t.version().number() != number) {
            throw refused(number, "its content names version " + t.version().number());
        }
        if (!t.version().hash().equals(rowHash)) {
            throw refused(number, "its content names hash " + shortHash(t.version().hash()) + ", the store recorded "
                    + shortHash(rowHash));
        }
        if (r.warnings().stream().anyMatch(p -> p.path().equals("$.version.hash"))) {
            throw refused(number, "its content does not match its hash " + shortHash(rowHash));
        }
        return t;
    }

    private static String first(ValidationReport r) {
        List<?> e = r.errors();
        return e.isEmpty() ? "no detail" : String.valueOf(e.get(0));
    }

    private static String shortHash(String h) {
        return h == null || h.isEmpty() ? "(none)" : h.substring(0, Math.min(12, h.length()));
    }

    private static StoreIntegrityException refused(int number, String why) {
        return new StoreIntegrityException("table store version " + number + " refused: " + why
                + "; the store was changed outside Ionmark (restore it from a backup)");
    }
}
