package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Curve;

/** A card is drawn once per distinct content; anything the card shows that changes is a new drawing. */
class CardCacheTest {
    private static AnnotatedStructure annotated(Annotator a, String smiles, double ph) {
        Entry e = new Entry("t", "t", List.of(new Block(Block.Kind.STRUCTURE, smiles, ph, 0)), 0);
        return a.annotate(e).structures().get(0);
    }

    private static AnnotatedStructure withCurve(AnnotatedStructure s, Curve c) {
        return new AnnotatedStructure(s.block(), s.words(), s.source(), s.structure(), s.conditions(), s.analyses(), c,
                s.phases(), s.error());
    }

    private static Curve copy(Curve c, double bump) {
        Map<Integer, double[]> sites = new LinkedHashMap<>();
        c.siteProtonated().forEach((k, v) -> sites.put(k, v.clone()));
        sites.values().iterator().next()[0] += bump;
        return new Curve(c.ph().clone(), c.meanCharge().clone(), sites, c.chargeStates());
    }

    @Test
    void aRepeatedQuickCheckIsDrawnOnceAndIsTheSameCard() {
        Annotator a = new Annotator(CardTest.SPECIATION);
        Map<String, String> params = Map.of("structure", "OC(=O)c1ccccc1O", "ph", "7.4");
        String first = QuickCheckForm.html(a, params);
        String second = QuickCheckForm.html(a, params);
        assertEquals(first, second);
        assertEquals(1, a.cards().misses());
        assertEquals(1, a.cards().hits());
        AnnotatedStructure s = annotated(a, "OC(=O)c1ccccc1O", 7.4);
        assertTrue(first.contains(new Card(s).html()), "the cached card is the card drawn without the cache");
    }

    @Test
    void sameNumbersInNewArraysHitAndAnyChangedNumberMisses() {
        Annotator a = new Annotator(CardTest.SPECIATION);
        AnnotatedStructure s = annotated(a, "NCC(=O)O", 7.4);
        String html = a.card(s);
        assertEquals(html, a.card(withCurve(s, copy(s.curve(), 0))), "a curve handed out as a copy is the same curve");
        assertEquals(1, a.cards().hits());
        a.card(withCurve(s, copy(s.curve(), 0.25)));
        a.card(annotated(a, "NCC(=O)O", 3.0));
        assertEquals(1, a.cards().hits());
        assertEquals(3, a.cards().misses());
    }

    @Test
    void anotherTableVersionIsDrawnAgain() {
        Annotator a = new Annotator(CardTest.SPECIATION);
        AnnotatedStructure s = annotated(a, "CC(=O)O", 7.4);
        Analysis x = s.analyses().get(0);
        Analysis other = new Analysis(x.input(), x.smiles(), x.stripped(), x.sites(), x.macroPka(), x.conditions(),
                x.netCharge(), x.fractionNeutral(), x.fractionUncharged(), x.chargeStates(), x.corrections(),
                x.warnings(), x.sampled(), "v999", x.uncoveredAtoms(), x.profile(), x.error(), x.errorPosition());
        String before = a.card(s);
        String after = a.card(new AnnotatedStructure(s.block(), s.words(), s.source(), s.structure(), s.conditions(),
                List.of(other), s.curve(), s.phases(), s.error()));
        assertNotEquals(before, after);
        assertTrue(after.contains("Table v999."));
        assertEquals(0, a.cards().hits());
    }

    @Test
    void theBoundIsKeptInCharactersLeastRecentlyUsedFirst() {
        Annotator a = new Annotator(CardTest.SPECIATION);
        AnnotatedStructure one = annotated(a, "CC(=O)O", 7.4);
        AnnotatedStructure two = annotated(a, "CCN", 7.4);
        AnnotatedStructure three = annotated(a, "c1ccccc1O", 7.4);
        CardCache c = new CardCache(25);
        AtomicInteger drawn = new AtomicInteger();
        java.util.function.Function<AnnotatedStructure, String> ten = s -> {
            drawn.incrementAndGet();
            return "x".repeat(10);
        };
        c.html(one, ten);
        c.html(two, ten);
        c.html(one, ten); // one is now the most recently used
        c.html(three, ten); // 30 characters: two goes
        assertEquals(2, c.size());
        assertEquals(20, c.chars());
        c.html(one, ten);
        c.html(two, ten);
        assertEquals(4, drawn.get(), "one stayed, two was drawn again");
        assertEquals(0, new CardCache(5).html(one, ten).length() - 10, "a card over the bound is still answered");
    }

    @Test
    void requestsForACardBeingDrawnWaitForThatDrawing() throws Exception {
        Annotator a = new Annotator(CardTest.SPECIATION);
        AnnotatedStructure s = annotated(a, "CC(=O)O", 7.4);
        CardCache c = new CardCache(1_000_000);
        CountDownLatch go = new CountDownLatch(1);
        AtomicInteger drawn = new AtomicInteger();
        java.util.function.Function<AnnotatedStructure, String> slow = x -> {
            drawn.incrementAndGet();
            try {
                go.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return "card";
        };
        String[] got = new String[2];
        Thread first = new Thread(() -> got[0] = c.html(s, slow));
        first.start();
        while (c.drawing() == 0) {
            Thread.sleep(5);
        }
        Thread second = new Thread(() -> got[1] = c.html(s, slow));
        second.start();
        while (second.getState() != Thread.State.WAITING) {
            Thread.sleep(5);
        }
        go.countDown();
        first.join(10_000);
        second.join(10_000);
        assertEquals(1, drawn.get(), "drawn once for both requests");
        assertEquals("card", got[0]);
        assertEquals("card", got[1]);
        assertEquals(0, c.drawing());
    }

    @Test
    void sizeZeroTurnsItOff() {
        Annotator a = new Annotator(CardTest.SPECIATION);
        AnnotatedStructure s = annotated(a, "CC(=O)O", 7.4);
        CardCache off = new CardCache(0);
        AtomicInteger drawn = new AtomicInteger();
        off.html(s, x -> "c" + drawn.incrementAndGet());
        off.html(s, x -> "c" + drawn.incrementAndGet());
        assertEquals(2, drawn.get());
        assertEquals(0, off.size());
    }
}
