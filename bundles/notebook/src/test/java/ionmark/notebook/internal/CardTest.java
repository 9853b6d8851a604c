package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.host.api.Block;
import ionmark.host.api.Decoration;
import ionmark.host.api.Entry;
import ionmark.host.api.HostUser;
import ionmark.speciation.internal.SpeciationService;

/** The annotator and its card, built with plain new (constructor injection). */
class CardTest {
    static final SpeciationService SPECIATION = new SpeciationService(TableSnapshotService.shipped(), 300, 10_000);
    static final Annotator ANNOTATOR = new Annotator(SPECIATION);
    static final HostUser USER = new HostUser("tester", Set.of("viewer"));

    static Block text(String t, int section) {
        return new Block(Block.Kind.TEXT, t, null, section);
    }

    static Block smiles(String s, int section) {
        return new Block(Block.Kind.STRUCTURE, s, null, section);
    }

    static List<Decoration> decorate(Block... blocks) {
        return ANNOTATOR.decorate(new Entry("t", "t", List.of(blocks), 0), USER);
    }

    @Test
    void eachStructureTakesTheNearestStatementBeforeItInItsSection() {
        List<Decoration> d = decorate(text("Work-up at pH 2.5.", 1), smiles("CC(=O)O", 1), text("Then pH 10.", 2),
                smiles("CC(=O)O", 2));
        assertTrue(d.get(0).html().contains("Sites at pH 2.5"));
        assertTrue(d.get(1).html().contains("Sites at pH 10"));
    }

    @Test
    void withoutAStatementInTheSectionTheEntrysFirstIsUsed() {
        List<Decoration> d = decorate(text("All buffers at pH 7.4.", 0), text("No pH here.", 1), smiles("CCN", 1));
        assertTrue(d.get(0).html().contains("Sites at pH 7.4"));
        assertTrue(d.get(0).html().contains("<q>pH 7.4</q>"), "names the words it took the pH from");
    }

    @Test
    void aBlocksOwnPhWins() {
        List<Decoration> d = decorate(text("at pH 7.4", 0), new Block(Block.Kind.STRUCTURE, "CCN", 2.0, 0));
        assertTrue(d.get(0).html().contains("Sites at pH 2"));
    }

    @Test
    void aRangeIsShownAtBothEnds() {
        String html = decorate(text("at pH 5–6", 0), smiles("CC(=O)O", 0)).get(0).html();
        assertTrue(html.contains("Sites at pH 5<") && html.contains("Sites at pH 6<"), html);
    }

    @Test
    void noPhSaysSoAndStillShowsSitePka() {
        String html = decorate(text("dissolved in water", 0), smiles("CC(=O)O", 0)).get(0).html();
        assertTrue(html.contains("No pH found"));
        assertTrue(html.contains("4.76"));
    }

    @Test
    void everyCardCarriesTheCaution() {
        String html = decorate(text("pH 7", 0), smiles("NCC(=O)O", 0)).get(0).html();
        assertTrue(html.contains(Card.CAUTION));
        assertTrue(html.contains("<svg"), "a depiction");
        assertTrue(html.contains("im-plot"), "a protonation plot");
    }

    @Test
    void unreadableStructureGivesAMessageNotAnException() {
        String html = decorate(text("pH 7", 0), smiles("C1CC(", 0)).get(0).html();
        assertTrue(html.contains("Cannot annotate"));
    }

    @Test
    void aStructureOverItsTimeBudgetSaysNotAnnotatedOnItsCard() {
        SpeciationService tight = new SpeciationService(TableSnapshotService.shipped(), 300, 200, 1, 0);
        try {
            tight.analyse("CC(=O)O", ionmark.speciation.api.Conditions.atPh(7)); // table-wide work, first use
            Entry e = new Entry("e", "t", List.of(text("pH 7", 0), smiles("N" + "CCN".repeat(80), 0)), 0);
            String html = new Annotator(tight).decorate(e, new HostUser("chemist", Set.of())).get(0).html();
            assertTrue(html.contains("Not annotated: over the time budget of 0.2 s per structure"), html);
            assertFalse(html.contains("Cannot annotate"), html);
        } finally {
            tight.close();
        }
    }

    @Test
    void scriptAndMarkupInEveryFieldAreEscaped() {
        String evil = "<script>alert(1)</script>\"'><img src=x onerror=alert(2)>";
        // as structure text, as stated words, and through the quick check's fields
        List<Decoration> d = decorate(text("at pH 7 " + evil, 0), smiles(evil, 0), smiles("CC(=O)O " + evil, 0));
        for (Decoration x : d) {
            assertFalse(x.html().contains("<script"), x.html());
            assertFalse(x.html().contains("<img"), x.html());
        }
        String panel = new QuickCheckPanel(SPECIATION).html(java.util.Map.of("structure", evil, "ph", evil, "temp",
                evil, "ionic", evil), USER);
        // the panel links its own script file (quick-check.js); the payload must not appear as markup
        assertFalse(panel.contains("<script>"), panel);
        assertFalse(panel.contains("<img"), panel);
        // shown, not dropped: the card's words escaped by the template
        assertTrue(d.stream().anyMatch(x -> x.html().contains("&lt;script&gt;alert(1)&lt;/script&gt;")), d.toString());
    }

    @Test
    void quickCheckRefusesAnImpossiblePh() {
        String html = new QuickCheckPanel(SPECIATION).html(java.util.Map.of("structure", "CCN", "ph", "22"), USER);
        assertTrue(html.contains("pH must be"), html);
    }

    @Test
    void theSolversWordsCountAtomsFromOneWithoutRewriting() {
        // boric acid OB(O)O: the first O-H is atom 1; cysteamine NCCS: the amine's coupling names the thiol S, atom 4
        String boric = decorate(text("at pH 7", 0), smiles("OB(O)O", 0)).get(0).html();
        assertTrue(boric.contains("atom 1 (O-H) looks ionizable"), boric);
        assertFalse(boric.contains("atom 0 "), boric);
        String cysteamine = decorate(text("at pH 7", 0), smiles("NCCS", 0)).get(0).html();
        assertTrue(cysteamine.contains("coupling with the thiol site on atom 4:"), cysteamine);
    }
}
