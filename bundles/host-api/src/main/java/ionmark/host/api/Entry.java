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
 */
public record Entry(String id, String title, List<Block> blocks, int pinnedTableVersion) {
    public Entry {
        Objects.requireNonNull(id, "id");
        title = title == null ? "" : title;
        blocks = List.copyOf(blocks);
    }
}
