package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;

/**
 * A sulfonic acid is ionised over the whole aqueous range, and the sulfo constants other sites see
 * for it are those of the sulfonate (Hansch, Leo and Taft 1991, from memory): the table exempts the
 * class from the distance rule, so its charge is not counted a second time. The shipped classes and
 * constants without measured compounds, with and without the exemption.
 */
class ExemptInteractionTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();

    static Engine engine(List<String> exempt) {
        SiteInteraction si = SHIPPED.interaction();
        return new Engine(new AcidityTable(SHIPPED.version(), SHIPPED.references(), SHIPPED.groups(),
                SHIPPED.substituents(), List.of(),
                new SiteInteraction(si.shifts(), si.decay(), si.cutoff(), si.source(), exempt), SHIPPED.pairs()), 300);
    }

    static Analysis analyse(Engine e, String smiles) {
        Analysis a = e.analyse(smiles, Conditions.noPh());
        assertTrue(a.ok(), a.error());
        return a;
    }

    @Test
    void theShippedTableExemptsSulfonicAcids() {
        assertTrue(SHIPPED.interaction().exempts("sulfonic"), SHIPPED.interaction().exempt().toString());
    }

    @Test
    void aBaseNextToASulfonateKeepsItsEstimateWhenTheClassIsExempt() {
        // orthanilic acid (2-aminobenzenesulfonic acid): anilinium pKa 2.48 (CRC Handbook, from memory); the
        // sulfonate O is four bonds from the amino N, where the distance rule adds 1.3 units
        String orthanilic = "Nc1ccccc1S(=O)(=O)O";
        Analysis exempt = analyse(engine(List.of("sulfonic")), orthanilic);
        Analysis counted = analyse(engine(List.of()), orthanilic);
        Site amino = exempt.sites().stream().filter(s -> s.element().equals("N")).findFirst().orElseThrow();
        double top = exempt.macroPka().get(exempt.macroPka().size() - 1);
        assertEquals(amino.pka(), top, 0.01, exempt.macroPka().toString());
        double before = counted.macroPka().get(counted.macroPka().size() - 1);
        assertTrue(before > top + 1.0, before + " against " + top);
        assertEquals(2.48, top, 1.0);
    }

    @Test
    void aHydroxyNextToTheSulfonateKeepsItsHydrogenBondThroughAPairRule() {
        // with the class exempt, the shipped pair rule carries what is particular to the ortho arrangement
        Engine shipped = new Engine(SHIPPED, 300);
        assertTrue(shipped.pairRules("O=S(=O)(O)c1ccccc1O").contains("sulfonate-ortho-hydroxy"));
        assertTrue(shipped.pairRules("O=S(=O)(O)c1cccc(O)c1").isEmpty());
    }

    @Test
    void otherPairsStillInteract() {
        // exempting the sulfonic class leaves a diacid alone: succinic acid's two constants stay apart
        Analysis a = analyse(engine(List.of("sulfonic")), "OC(=O)CCC(=O)O");
        Analysis b = analyse(engine(List.of()), "OC(=O)CCC(=O)O");
        assertEquals(b.macroPka(), a.macroPka());
    }
}
