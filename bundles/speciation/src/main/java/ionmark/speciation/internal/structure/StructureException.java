package ionmark.speciation.internal.structure;

import ionmark.speciation.api.ErrorPosition;

/** Input that cannot be analysed; the message is one line for a chemist, the position where the reader can say. */
public final class StructureException extends Exception {
    private static final long serialVersionUID = 1L;

    private final transient ErrorPosition position;

    public StructureException(String message) {
        this(message, null);
    }

    public StructureException(String message, ErrorPosition position) {
        super(message);
        this.position = position;
    }

    /** Where in the input, or null. */
    public ErrorPosition position() {
        return position;
    }
}
