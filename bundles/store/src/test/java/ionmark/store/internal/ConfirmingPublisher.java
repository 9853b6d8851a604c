package ionmark.store.internal;

import ionmark.store.api.VersionInfo;

/**
 * Run in a child process by {@link ConfirmedPublishKillTest}: publishes and prints {@code confirmed N HASH}
 * after each publish returned, the moment a user would be told "published". Mode {@code loop} publishes
 * until killed; mode {@code once} publishes one version and then halts the JVM without closing anything,
 * the way the command line ended before it closed the store.
 */
public final class ConfirmingPublisher {
    private ConfirmingPublisher() {
    }

    public static void main(String[] args) throws Exception {
        String mode = args[0];
        JdbcTableStore s = new JdbcTableStore(Backends.TABLES, args[1], args[2], args[3]);
        System.out.println("ready");
        System.out.flush();
        for (int i = 0;; i++) {
            int head = s.head().map(VersionInfo::number).orElse(0);
            VersionInfo v = s.publish(StoreTest.table(String.format(java.util.Locale.ROOT, "%.2f", 4 + (i % 500) / 100.0)),
                    head, "loop", "publish " + i);
            System.out.println("confirmed " + v.number() + " " + v.hash());
            System.out.flush();
            if (mode.equals("once")) {
                Runtime.getRuntime().halt(0);
            }
        }
    }
}
