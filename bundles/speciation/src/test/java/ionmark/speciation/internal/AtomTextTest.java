package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Term;

/**
 * Atoms in the solver's words count from 1; the same atoms as data are indices from 0 like {@code Site.atom()},
 * so a reader of the text and a program reading the indices land on the same atom without parsing words.
 */
class AtomTextTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();

    @Test
    void anUncoveredAtomIsNamedFromOneAndListedFromZero() {
        // boric acid, OB(O)O: the table's site is the boron; the three O-H (indices 0, 2, 3) are listed apart
        Analysis a = new Engine(SHIPPED, 300).analyse("OB(O)O", Conditions.noPh());
        assertEquals(List.of(0, 2, 3), a.uncoveredAtoms(), a.warnings().toString());
        assertTrue(a.warnings().contains("atom 1 (O-H) looks ionizable but is outside the table: not estimated"),
                a.warnings().toString());
        assertTrue(a.warnings().stream().noneMatch(w -> w.startsWith("atom 0 ")), a.warnings().toString());
    }

    @Test
    void aPairRuleLineNamesItsPartnerFromOneAndCarriesItsIndex() {
        // maleic acid, OC(=O)/C=C\C(=O)O: the hydroxyl oxygens are indices 0 and 7, atoms 1 and 8 to a chemist
        Analysis maleic = PairRuleTest.shippedRules().analyse("OC(=O)/C=C\\C(=O)O", Conditions.noPh());
        for (Site s : maleic.sites()) {
            Term rule = s.derivation().stream().filter(t -> t.label().startsWith("pair rule")).findFirst().orElseThrow();
            int partner = s.atom() == 0 ? 7 : 0;
            assertEquals(List.of(partner), rule.atoms(), rule.toString());
            assertTrue(rule.label().contains("site on atom " + (partner + 1) + " ("), rule.label());
        }
    }
}
