package ionmark.acidity.api;

import java.util.Objects;

/** A citable source: a short id used in records, and the full citation. */
public record Reference(String id, String citation) {
    public Reference {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(citation, "citation");
    }
}
