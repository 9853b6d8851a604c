package ionmark.speciation.internal.structure;

import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.Engine;

/**
 * Random and mutated SMILES and molfiles thrown at the reader on its own and at the whole engine.
 * The reader is called directly, without the engine's catch-all for runtime exceptions: every input
 * ends in a read structure or a {@link StructureException} with a one-line message, never another
 * exception. Every call has a time limit ({@link #LIMIT_SECONDS}), so a hang fails instead of
 * stopping the build.
 */
class ReaderFuzzTest {
    static final Engine ENGINE = new Engine(TableSnapshotService.shipped(), 300);
    static final StructureReader READER = new StructureReader(300);
    /** Far above the few milliseconds a read takes, so that only a hang or a runaway search fails on a loaded machine. */
    static final int LIMIT_SECONDS = 20;
    static final ExecutorService WORKER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "reader-fuzz");
        t.setDaemon(true);
        return t;
    });
    static final List<String> SEEDS = List.of("CC(=O)O", "NCC(=O)O", "c1ccncc1", "OC(=O)c1ccc(N)cc1",
            "CN1CCN(CC1)c1ccccc1", "OP(=O)(O)O", "C[N+](C)(C)C", "O=C1NC(=O)c2ccccc12", "c1nn[nH]n1",
            "CC(C)Cc1ccc(cc1)C(C)C(=O)O", "[O-][n+]1ccccc1", "NC(N)=N");
    static final String ALPHABET = "CNOSPFIBrcnos()[]=#123456789+-@/\\.%H ";

    @Provide
    Arbitrary<String> mutatedSmiles() {
        return Arbitraries.of(SEEDS).flatMap(seed -> Arbitraries.integers().between(0, seed.length())
                .flatMap(pos -> Arbitraries.of(ALPHABET.chars().mapToObj(c -> String.valueOf((char) c)).toList())
                        .flatMap(ch -> Arbitraries.of(0, 1, 2).map(op -> switch (op) {
                            case 0 -> seed.substring(0, pos) + ch + seed.substring(pos);
                            case 1 -> pos < seed.length() ? seed.substring(0, pos) + seed.substring(pos + 1) : seed;
                            default -> pos < seed.length() ? seed.substring(0, pos) + ch + seed.substring(pos + 1) : seed;
                        }))));
    }

    @Provide
    Arbitrary<String> randomText() {
        return Arbitraries.strings().withChars(ALPHABET.toCharArray()).ofMinLength(0).ofMaxLength(40);
    }

    @Provide
    Arbitrary<String> mutatedMolfiles() {
        String mol = """

                  Ionmark

                  3  2  0  0  0  0  0  0  0  0999 V2000
                    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                    1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                    2.5981    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
                  1  2  1  0
                  2  3  1  0
                M  END
                """;
        return Arbitraries.integers().between(0, mol.length() - 1).flatMap(pos -> Arbitraries.chars()
                .with("0123456789 CNOX.-\n".toCharArray()).map(c -> mol.substring(0, pos) + c + mol.substring(pos + 1)));
    }

    @Property(tries = 1500)
    void mutatedSmilesNeverBreakTheEngine(@ForAll("mutatedSmiles") String smi) {
        check(smi);
    }

    @Property(tries = 1500)
    void randomTextNeverBreaksTheEngine(@ForAll("randomText") String text) {
        check(text);
    }

    @Property(tries = 500)
    void mutatedMolfilesNeverBreakTheEngine(@ForAll("mutatedMolfiles") String mol) {
        check(mol);
    }

    private static void check(String input) {
        String refusal = withinLimit(input, () -> {
            try {
                READER.read(input);
                return null;
            } catch (StructureException e) {
                return String.valueOf(e.getMessage());
            }
        });
        if (refusal != null && (refusal.isBlank() || refusal.contains("\n"))) {
            throw new AssertionError("the reader's refusal must be one non-empty line, was: " + refusal);
        }
        Analysis a = withinLimit(input, () -> ENGINE.analyse(input, Conditions.atPh(7.4)));
        if (!a.ok() && (a.error() == null || a.error().isBlank() || a.error().contains("\n"))) {
            throw new AssertionError("error must be one non-empty line, was: " + a.error());
        }
    }

    /** Runs the call on the worker; an exception other than the declared refusal, or no answer in time, fails. */
    private static <T> T withinLimit(String input, Callable<T> call) {
        Future<T> f = WORKER.submit(call);
        try {
            return f.get(LIMIT_SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            f.cancel(true);
            throw new AssertionError("no answer within " + LIMIT_SECONDS + " s for: " + input, e);
        } catch (ExecutionException e) {
            throw new AssertionError("threw " + e.getCause() + " for: " + input, e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
    }
}
