package ionmark.speciation.internal.structure;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Structures Ionmark cannot treat are refused with the reason, instead of analysed into wrong numbers (before,
 * dimethylmercury, a methyl radical and a tert-butyl cation were all analysed without a word).
 */
class TreatableTest {
    static final StructureReader READER = new StructureReader(300);

    static void refused(String smiles, String because) {
        StructureException e = assertThrows(StructureException.class, () -> READER.read(smiles), smiles);
        assertTrue(e.getMessage().contains(because), e.getMessage());
    }

    static void read(String smiles) {
        assertTrue(assertDoesNotThrow(smiles).molecule().getAtomCount() > 0);
    }

    static StructureReader.Prepared assertDoesNotThrow(String smiles) {
        return org.junit.jupiter.api.Assertions.assertDoesNotThrow(() -> READER.read(smiles), smiles);
    }

    @Test
    void organometallic() {
        refused("C[Hg]C", "atom 2 (Hg) is a metal");
    }

    @Test
    void trimethylphenyltin() {
        refused("C[Sn](C)(C)c1ccccc1", "atom 2 (Sn) is a metal");
    }

    @Test
    void saltDrawnWithABondToSodium() {
        refused("CC(=O)O[Na]", "can be written as ions, for example CC(=O)[O-].[Na+]");
    }

    @Test
    void saltDrawnAsIonsIsRead() {
        read("CC(=O)[O-].[Na+]");
    }

    @Test
    void methylRadical() {
        refused("[CH3]", "a radical or carbene");
    }

    @Test
    void carbeneOfAnImidazolylidene() {
        refused("CN1C=CN(C)[C]1", "a radical or carbene");
    }

    @Test
    void tertButylCation() {
        refused("C[C+](C)C", "is a carbocation");
    }

    @Test
    void twoChargesOnOneAtom() {
        refused("C[N+2](C)(C)(C)C", "charge of +2");
    }

    @Test
    void nitroNOxideQuaternaryAmmoniumAndCarboxylateAreRead() {
        read("O=[N+]([O-])c1ccccc1");
        read("[O-][n+]1ccccc1");
        read("C[N+](C)(C)CC(=O)O");
        read("CC(=O)[O-]");
        read("[C-]#[N+]c1ccccc1");
    }

    @Test
    void aromaticRingsAsSmilesAreRead() {
        read("c1ccc2[nH]ccc2c1");
        read("Oc1ccncc1");
    }
}
