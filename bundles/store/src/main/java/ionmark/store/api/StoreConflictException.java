package ionmark.store.api;

/** A publish named a base version that is no longer the head: someone else published first. */
public final class StoreConflictException extends Exception {
    private static final long serialVersionUID = 1L;
    private final int head;

    public StoreConflictException(int basedOn, int head) {
        super("the draft is based on version " + basedOn + " but the head is now version " + head
                + ": review the newer version and publish again");
        this.head = head;
    }

    public int head() {
        return head;
    }
}
