package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import ionmark.host.api.Entry;
import ionmark.host.api.HostUser;

/** Who may edit, and what the host says above an entry. */
class EntryPagesTest {
    @Test
    void aVisitorWhoHasNotSignedInMayNotEditWhateverTheRoles() {
        assertFalse(EditPolicy.mayEdit(new HostUser("chemist", Set.of("viewer", "editor")), false));
    }

    @Test
    void aSignedInViewerMayNotEdit() {
        assertFalse(EditPolicy.mayEdit(new HostUser("v", Set.of("viewer")), true));
    }

    @Test
    void aSignedInEditorMayEdit() {
        assertTrue(EditPolicy.mayEdit(new HostUser("e", Set.of("viewer", "editor")), true));
    }

    @Test
    void structuresWithoutARunningAnnotatorSayThatAnnotationsAreLoading() {
        Entry e = Workspace.parse("x", "# T\n\n```smiles\nCCN\n```\n");
        assertTrue(EntryPages.notices(e, false).contains("Annotations are loading"));
        assertFalse(EntryPages.notices(e, true).contains("loading"));
    }

    @Test
    void newEntryIdsComeFromTheTitleAndNeverClash() {
        assertEquals("work-up-of-batch-7", EntryPages.idFor("Work-up of batch 7!", List.of()));
        assertEquals("work-up-2", EntryPages.idFor("Work up", List.of("work-up")));
    }

    @Test
    void errorPagesAreEscaped() {
        assertFalse(EntryPages.error(404, "<script>", false).contains("<script>"));
    }
}
