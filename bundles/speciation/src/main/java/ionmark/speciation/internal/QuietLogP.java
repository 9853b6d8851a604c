package ionmark.speciation.internal;

import java.io.OutputStream;
import java.io.PrintStream;

/**
 * CDK's JPlogP descriptor prints a line to standard output for every atom type it does not know,
 * which would corrupt machine-readable output (check --format json). Standard output is wrapped
 * once in a stream that drops what a thread writes while it computes logP, and only that: other
 * threads' output passes untouched.
 */
final class QuietLogP {
    private static final ThreadLocal<Boolean> COMPUTING = ThreadLocal.withInitial(() -> false);
    private static volatile boolean installed;

    private QuietLogP() {
    }

    static synchronized void install() {
        if (installed) {
            return;
        }
        PrintStream original = System.out;
        System.setOut(new PrintStream(new OutputStream() {
            @Override
            public void write(int b) {
                if (!COMPUTING.get()) {
                    original.write(b);
                }
            }

            @Override
            public void write(byte[] b, int off, int len) {
                if (!COMPUTING.get()) {
                    original.write(b, off, len);
                }
            }

            @Override
            public void flush() {
                original.flush();
            }
        }, true));
        installed = true;
    }

    static <T> T quietly(java.util.function.Supplier<T> work) {
        install();
        COMPUTING.set(true);
        try {
            return work.get();
        } finally {
            COMPUTING.set(false);
        }
    }
}
