package ionmark.pipeline;

import java.io.Serializable;
import java.util.List;

/**
 * Structures travel between stages in chunks: one element per structure costs the direct runner more than a
 * brief analysis does, and a chunk still spreads a large file over every worker.
 */
public record Chunk(List<Structure> structures) implements Serializable {
    private static final long serialVersionUID = 1L;
    /** Structures per chunk: small enough to spread a 10,000-structure file over many workers. */
    public static final int SIZE = 32;

    public Chunk {
        structures = List.copyOf(structures);
    }
}
