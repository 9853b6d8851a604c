package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.host.api.Block;
import ionmark.host.api.Entry;

/** Which entries a draft changes at the pH they state, and what a pinned entry keeps. */
class EntryImpactTest {
    static final AcidityTable HEAD = TableSnapshotService.shipped();
    // pentylamine near 10.6 (CRC, from memory): about half neutral at pH 10.6; the draft moves the class two units
    static final AcidityTable DRAFT = sealed(HEAD.withGroups(HEAD.groups().stream()
            .map(g -> g.id().equals("amine-primary") ? g.withPka(g.pka() - 2, "crc") : g).toList()));

    /** Written and read again, so that its version hash is its content's (as the admin page does). */
    static AcidityTable sealed(AcidityTable t) {
        TableSnapshotService s = new TableSnapshotService(null);
        return s.validate(s.toJson(t)).table().orElseThrow();
    }

    static Entry entry(String id, String ph, int pinned) {
        return new Entry(id, id, List.of(new Block(Block.Kind.TEXT, "Held at pH " + ph + ".", null, 0),
                new Block(Block.Kind.STRUCTURE, "CCCCCN", null, 0)), pinned);
    }

    @Test
    void anEntryWhoseFractionNeutralMovesIsListed() {
        var rows = EntryImpact.rows(List.of(entry("amine-10", "10.5", 0), entry("amine-2", "2.0", 0)),
                CardTest.SPECIATION, HEAD, DRAFT, 0.10);
        assertEquals(1, rows.size(), rows.toString());
        assertEquals("amine-10", rows.get(0).entry().id());
        // more neutral with the class two units lower; by less than the class move alone would give, because the
        // table's measured ethane-1,2-diamine, pentylamine's one analog, moves with the class and takes part of it back
        assertTrue(rows.get(0).neutralDraft() > rows.get(0).neutralHead() + 0.10, rows.toString());
    }

    @Test
    void aPinnedEntryIsSaidToKeepItsVersion() {
        var rows = EntryImpact.rows(List.of(entry("pinned", "10.5", 3)), CardTest.SPECIATION, HEAD, DRAFT, 0.10);
        assertTrue(EntryImpact.html(rows, 1, 0.10).contains("pinned to v3: keeps showing v3"));
    }
}
