package ionmark.store.internal;

/** A stored version failed its content check; it is not read, installed or published from. */
final class StoreIntegrityException extends IllegalStateException {
    private static final long serialVersionUID = 1L;

    StoreIntegrityException(String message) {
        super(message);
    }
}
