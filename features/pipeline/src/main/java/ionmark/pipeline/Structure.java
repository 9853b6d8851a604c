package ionmark.pipeline;

import java.io.Serializable;
import java.util.List;

/**
 * One structure to annotate as read from a file, or one whole Markdown entry ({@code entry}), whose structures
 * and conditions the notebook's own reader finds in the annotating step ({@link EntryRecords}).
 *
 * @param source        the file it came from
 * @param id            the record id ({@code batch}'s rule for SMILES/TSV/SDF); for an entry, its name
 * @param text          SMILES or molfile text; for an entry, its Markdown
 * @param error         a reading error (the record is written with it, never dropped), else null
 * @param phs           the pH values to annotate at; empty: no pH
 * @param pinnedVersion the table version a Markdown entry is pinned to ({@code Table version: vN}), else 0
 * @param entry         true when {@code text} is a whole Markdown entry
 */
public record Structure(String source, String id, String text, String error, List<Double> phs, int pinnedVersion,
        boolean entry) implements Serializable {
    private static final long serialVersionUID = 1L;

    public Structure {
        phs = List.copyOf(phs);
    }

    /** A structure read from a SMILES, TSV or SDF file. */
    public static Structure of(String source, String id, String text, String error, List<Double> phs) {
        return new Structure(source, id, text, error, phs, 0, false);
    }

    /** A whole Markdown entry named {@code id}. */
    public static Structure entry(String source, String id, String markdown, List<Double> phs) {
        return new Structure(source, id, markdown, null, phs, 0, true);
    }
}
