package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.internal.TableSnapshotService;

/** The admin page's record forms, each rule a chemist meets in them. */
class DraftEditsTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();

    @Test
    void aMeasuredValueGoesToItsPerceivedSite() {
        // 4-chlorophenol 9.41 (CRC Handbook, from memory)
        var r = DraftEdits.measured(SHIPPED, Map.of("name", "4-chlorophenol", "smiles", "Oc1ccc(Cl)cc1", "pka", "9.41",
                "source", "crc"), CardTest.SPECIATION);
        assertTrue(r.ok(), r.errors().toString());
        var m = r.table().measured().get(r.table().measured().size() - 1);
        assertEquals("4-chlorophenol", m.id());
        assertEquals(java.util.List.of("phenol"), m.groups());
    }

    @Test
    void moreValuesThanSitesIsAnError() {
        var r = DraftEdits.measured(SHIPPED, Map.of("name", "phenol", "smiles", "Oc1ccccc1", "pka", "2.0, 9.99",
                "source", "crc"), CardTest.SPECIATION);
        assertTrue(r.errors().get(0).contains("no site can take"), r.errors().toString());
    }

    @Test
    void aValueFarFromEverySiteIsAnError() {
        // acetic acid 4.76; a typed 14.76 is no carboxylic acid's value
        var r = DraftEdits.measured(SHIPPED, Map.of("name", "acetic slip", "smiles", "CC(=O)O", "pka", "14.76",
                "source", "crc"), CardTest.SPECIATION);
        assertTrue(r.errors().get(0).contains("no perceived site can take it"), r.errors().toString());
    }

    @Test
    void aHandSetClassValueNeedsASource() {
        var r = DraftEdits.classValue(SHIPPED, Map.of("group", "amine-primary", "pka", "10.65"));
        assertTrue(r.errors().get(0).contains("Choose the source"), r.errors().toString());
    }

    @Test
    void aHandSetClassValueCannotKeepTheCalibrationsCitation() {
        String calibration = SHIPPED.fit("amine-primary").orElseThrow().source();
        var r = DraftEdits.classValue(SHIPPED, Map.of("group", "amine-primary", "pka", "10.65", "source", calibration));
        assertTrue(r.errors().get(0).contains("calibration's citation"), r.errors().toString());
    }

    @Test
    void anUnchangedSourceMustBeConfirmed() {
        var g = SHIPPED.group("amine-primary").orElseThrow();
        AcidityTable handSet = DraftEdits.classValue(SHIPPED, Map.of("group", g.id(), "pka", "10.65", "source", "crc"))
                .table();
        var again = DraftEdits.classValue(handSet, Map.of("group", g.id(), "pka", "10.70", "source", "crc"));
        assertTrue(again.errors().get(0).contains("confirm"), again.errors().toString());
        assertTrue(DraftEdits.classValue(handSet, Map.of("group", g.id(), "pka", "10.70", "source", "crc", "confirm",
                "yes")).ok());
    }

    @Test
    void aHandSetValueDropsItsFitProvenance() {
        var r = DraftEdits.classValue(SHIPPED, Map.of("group", "amine-primary", "pka", "10.65", "source", "crc"));
        assertTrue(r.ok(), r.errors().toString());
        assertEquals("crc", r.table().group("amine-primary").orElseThrow().source("pka"));
        assertFalse(r.table().fit("amine-primary").orElseThrow().after().containsKey("pka"));
    }

    @Test
    void aReferenceNeedsAnIdAndAFullCitation() {
        assertFalse(DraftEdits.reference(SHIPPED, Map.of("refid", "Bad Id", "citation", "Someone 2020")).ok());
        assertFalse(DraftEdits.reference(SHIPPED, Map.of("refid", "crc", "citation", "CRC Handbook again")).ok());
        assertTrue(DraftEdits.reference(SHIPPED, Map.of("refid", "albert1984", "citation",
                "Albert, A.; Serjeant, E. P. The Determination of Ionization Constants, 3rd ed., 1984.")).ok());
    }
}
