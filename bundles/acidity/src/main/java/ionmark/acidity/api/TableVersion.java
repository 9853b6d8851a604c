package ionmark.acidity.api;

/**
 * Version metadata of a table snapshot.
 *
 * @param number  1, 2, 3 … in publish order
 * @param author  who published it
 * @param time    ISO-8601 instant
 * @param comment why it changed
 * @param hash    SHA-256 of the canonical content (everything but this block), hex
 * @param parent  number of the version it was based on, 0 for the first
 */
public record TableVersion(int number, String author, String time, String comment, String hash, int parent) {
    public TableVersion {
        author = author == null ? "" : author;
        time = time == null ? "" : time;
        comment = comment == null ? "" : comment;
        hash = hash == null ? "" : hash;
    }

    /** "v3 (1a2b3c4d)": short, for display beside every annotation. */
    public String label() {
        return "v" + number + (hash.length() >= 8 ? " (" + hash.substring(0, 8) + ")" : "");
    }
}
