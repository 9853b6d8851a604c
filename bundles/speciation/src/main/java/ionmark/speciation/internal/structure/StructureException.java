package ionmark.speciation.internal.structure;

/** Input that cannot be analysed; the message is one line for a chemist. */
public final class StructureException extends Exception {
    private static final long serialVersionUID = 1L;

    public StructureException(String message) {
        super(message);
    }
}
