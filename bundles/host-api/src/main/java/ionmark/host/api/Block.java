package ionmark.host.api;

import java.util.Objects;

/**
 * One block of an entry, in order.
 *
 * @param kind    text (Markdown), structure (SMILES or molfile in {@link #content()}) or table
 * @param content the block's text
 * @param ph      a pH the block states for itself (structure blocks only), or null
 * @param section index of the section (heading) the block belongs to, 0 before the first heading
 */
public record Block(Kind kind, String content, Double ph, int section) {
    public enum Kind { TEXT, STRUCTURE, TABLE }

    public Block {
        Objects.requireNonNull(kind, "kind");
        content = content == null ? "" : content;
    }
}
