package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.ErrorPosition;

/** The card marks the character of an unreadable SMILES that the reader stopped at. */
class ErrorMarkerTest {
    static String marked(String input, ErrorPosition at) {
        return ErrorMarker.html(Analysis.failed(input, Conditions.noPh(), "", "cannot read SMILES", at));
    }

    @Test
    void theCharacterIsMarkedAndCountedFromOne() {
        String html = marked("CC(=O)Ox", ErrorPosition.character(7));
        assertTrue(html.contains("<code>CC(=O)O<mark>x</mark></code>"), html);
        assertTrue(html.contains("character 8"), html);
    }

    @Test
    void theSmilesIsEscaped() {
        assertTrue(marked("C<C", ErrorPosition.character(1)).contains("C<mark>&lt;</mark>C"));
    }

    @Test
    void theOffsetCountsInTheFirstWordAfterLeadingBlanks() {
        assertTrue(marked("  C(C aspirin", ErrorPosition.character(2)).contains("<code>C(<mark>C</mark></code>"));
    }

    @Test
    void noCharacterPositionNoMarker() {
        assertEquals("", marked("CC", ErrorPosition.atom(0)));
        assertEquals("", marked("CC", null));
    }
}
