package ionmark.store.internal;

/** Run in a child process by CrashTest: publishes versions until it is killed. */
public final class PublishLoop {
    private PublishLoop() {
    }

    public static void main(String[] args) throws Exception {
        JdbcTableStore s = new JdbcTableStore(Backends.TABLES, args[0], args.length > 1 ? args[1] : "sa",
                args.length > 2 ? args[2] : "");
        System.out.println("ready");
        System.out.flush();
        for (int i = 0;; i++) {
            int head = s.head().map(v -> v.number()).orElse(0);
            s.publish(StoreTest.table(String.format("%.2f", 4 + (i % 500) / 100.0)), head, "loop", "publish " + i);
        }
    }
}
