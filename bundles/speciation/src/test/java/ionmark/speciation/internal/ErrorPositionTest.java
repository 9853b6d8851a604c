package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.CurveResult;
import ionmark.speciation.api.ErrorPosition;

/**
 * Where an unreadable structure went wrong. The expected offsets are counted on the SMILES itself: the
 * character the grammar cannot take, or, where a branch or ring is left open, the last character, after which
 * the text ended too early.
 */
class ErrorPositionTest {
    static final SpeciationService SERVICE = new SpeciationService(TableSnapshotService.shipped(), 300, 60_000, 1, 0);

    static ErrorPosition at(String smiles) {
        Analysis a = SERVICE.analyse(smiles, Conditions.noPh());
        assertFalse(a.ok(), smiles + " was read");
        return a.errorPosition();
    }

    @Test
    void aCharacterOutsideTheGrammarIsPointedAt() {
        assertEquals(ErrorPosition.character(7), at("CC(=O)Ox")); // the x
    }

    @Test
    void aBranchLeftOpenIsPointedAtTheLastCharacter() {
        assertEquals(ErrorPosition.character(2), at("C(C"));
    }

    @Test
    void aRingLeftOpenIsPointedAtTheLastCharacter() {
        assertEquals(ErrorPosition.character(6), at("c1ccccc"));
    }

    @Test
    void theOffsetCountsFromTheSmilesAsReadNotFromLeadingBlanks() {
        assertEquals(ErrorPosition.character(7), at("   CC(=O)Ox"));
    }

    @Test
    void theCaretStandsUnderTheCharacter() {
        assertEquals("       ^", ErrorPosition.character(7).caret());
        assertEquals("", ErrorPosition.atom(1).caret());
    }

    @Test
    void anImpossibleValenceNamesTheAtom() {
        Analysis a = SERVICE.analyse("C[N](C)(C)(C)(C)C", Conditions.noPh());
        assertEquals(ErrorPosition.atom(1), a.errorPosition(), a.error()); // the N, second heavy atom
        assertTrue(a.error().contains("atom 2"), a.error()); // the message counts from 1, as a chemist does
    }

    @Test
    void aStructureThatWasReadHasNoPosition() {
        Analysis a = SERVICE.analyse("CC(=O)O", Conditions.noPh());
        assertTrue(a.ok());
        assertNull(a.errorPosition());
    }

    @Test
    void anUnreadableCurveIsAFailureWithTheSameMessageAndPosition() {
        CurveResult r = SERVICE.curve("CC(=O)Ox", Conditions.noPh(), 0, 14, 0.5);
        Analysis a = SERVICE.analyse("CC(=O)Ox", Conditions.noPh());
        assertFalse(r.ok());
        assertNull(r.curve());
        assertEquals(a.error(), r.error());
        assertEquals(a.errorPosition(), r.errorPosition());
    }

    @Test
    void aCurveOverABadRangeIsAFailureThatSaysWhy() {
        CurveResult r = SERVICE.curve("CC(=O)O", Conditions.noPh(), 14, 0, 0.5);
        assertFalse(r.ok());
        assertTrue(r.error().contains("from <= to"), r.error());
    }

    @Test
    void aCurveThatWorksHasItsPoints() {
        CurveResult r = SERVICE.curve("CC(=O)O", Conditions.noPh(), 0, 14, 0.5);
        assertTrue(r.ok(), r.error());
        assertEquals(29, r.curve().ph().length);
    }
}
