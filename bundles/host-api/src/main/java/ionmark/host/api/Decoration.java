package ionmark.host.api;

/**
 * HTML a contributor asks the host to show right after a block. The HTML is complete and escaped
 * by the contributor; the host inserts it as is.
 *
 * @param block index of the block it belongs to
 * @param html  the fragment
 */
public record Decoration(int block, String html) {
}
