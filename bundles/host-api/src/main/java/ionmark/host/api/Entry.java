package ionmark.host.api;

import java.util.List;
import java.util.Objects;

/**
 * A notebook entry: an ordered list of blocks.
 *
 * @param id       stable id within the host
 * @param title    title line
 * @param blocks   content in order
 * @param pinnedTableVersion a table version the entry is pinned to (0: follow the current table)
 * @param notices  what the host could not read as written (an unclosed fence, an empty structure block), in
 *                 words a chemist understands; empty when none
 */
public record Entry(String id, String title, List<Block> blocks, int pinnedTableVersion, List<String> notices) {
    public Entry {
        Objects.requireNonNull(id, "id");
        title = title == null ? "" : title;
        blocks = List.copyOf(blocks);
        notices = notices == null ? List.of() : List.copyOf(notices);
    }

    /** An entry without notices. */
    public Entry(String id, String title, List<Block> blocks, int pinnedTableVersion) {
        this(id, title, blocks, pinnedTableVersion, List.of());
    }
}
