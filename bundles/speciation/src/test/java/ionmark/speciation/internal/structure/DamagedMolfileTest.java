package ionmark.speciation.internal.structure;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Damaged molfiles found by {@link ReaderFuzzTest}, kept as fixed cases. */
class DamagedMolfileTest {
    /** Ethanol's molfile with the first bond line's second atom number changed from 2 to 25 (3 atoms). */
    static final String BOND_TO_MISSING_ATOM = """

              Ionmark

              3  2  0  0  0  0  0  0  0  0999 V2000
                0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                2.5981    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
              1  25 1  0
              2  3  1  0
            M  END
            """;

    @Test
    void aBondToAnAtomTheRecordDoesNotHaveIsAPlainError() {
        StructureException e = assertThrows(StructureException.class,
                () -> new StructureReader(300).read(BOND_TO_MISSING_ATOM));
        assertTrue(e.getMessage().startsWith("cannot read molfile") && e.getMessage().contains("atom"),
                e.getMessage());
    }
}
