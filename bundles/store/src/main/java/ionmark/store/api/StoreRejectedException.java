package ionmark.store.api;

import java.util.List;

/** A publish whose table does not validate, or that lacks a comment: the head does not change. */
public final class StoreRejectedException extends Exception {
    private static final long serialVersionUID = 1L;
    private final List<String> problems;

    public StoreRejectedException(List<String> problems) {
        super("rejected: " + problems.size() + " problem(s), first: " + (problems.isEmpty() ? "" : problems.get(0)));
        this.problems = List.copyOf(problems);
    }

    public List<String> problems() {
        return problems;
    }
}
