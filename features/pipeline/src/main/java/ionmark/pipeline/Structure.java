package ionmark.pipeline;

import java.io.Serializable;
import java.util.List;

/**
 * One structure to annotate, as read from a file.
 *
 * @param source        the file it came from
 * @param id            the record id ({@code batch}'s rule for SMILES/TSV/SDF; {@code entry#n} for Markdown)
 * @param text          SMILES or molfile text
 * @param error         a reading error (the record is written with it, never dropped), else null
 * @param phs           the pH values to annotate at; empty: no pH
 * @param pinnedVersion the table version a Markdown entry is pinned to ({@code Table version: vN}), else 0
 */
public record Structure(String source, String id, String text, String error, List<Double> phs, int pinnedVersion)
        implements Serializable {
    private static final long serialVersionUID = 1L;

    public Structure {
        phs = List.copyOf(phs);
    }
}
