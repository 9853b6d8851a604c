package ionmark.store.api;

import java.time.Instant;

/** One published version: immutable once written. */
public record VersionInfo(int number, String author, Instant time, String comment, String hash, int parent) {
}
