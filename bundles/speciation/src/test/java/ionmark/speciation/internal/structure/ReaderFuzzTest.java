package ionmark.speciation.internal.structure;

import java.util.List;

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
 * Random and mutated SMILES and molfiles thrown at the reader and the whole engine: every input
 * ends in an analysis or a one-line error, never an exception and never a hang (jqwik's timeout).
 */
class ReaderFuzzTest {
    static final Engine ENGINE = new Engine(TableSnapshotService.shipped(), 300);
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
        Analysis a = ENGINE.analyse(input, Conditions.atPh(7.4));
        if (!a.ok() && (a.error() == null || a.error().isBlank() || a.error().contains("\n"))) {
            throw new AssertionError("error must be one non-empty line, was: " + a.error());
        }
    }
}
