package ionmark.speciation.measured;

import java.util.List;

import org.osgi.annotation.versioning.ProviderType;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Reference;

/**
 * Reads measured values in bulk (TSV or SDF), checks every row against the table they are meant for, and
 * makes a draft table: the head with the valid rows as measured compounds. Thread-safe.
 *
 * <p>TSV columns, in this order, one header line allowed: {@code id, smiles, pka_values} (';'-separated,
 * ascending), {@code temperature} (°C), {@code ionic_strength} (mol/L), {@code method}, {@code source}
 * (a reference id of the table, or the citation text of a new reference), {@code name}. SDF: the molfile
 * is the structure, the same names as data fields ({@code smiles} not needed).
 */
@ProviderType
public interface MeasuredImport {
    enum Format {
        TSV, SDF
    }

    /**
     * One row of the file.
     *
     * @param line      line number (TSV) or record number (SDF), counted from 1
     * @param compound  the measured compound as it would enter the table (null when the row cannot be read)
     * @param sites     the perceived titratable sites the values go to (class ids, in value order)
     * @param predicted the head's macroscopic constants for the structure, for the preview
     * @param problems  why the row cannot go into the draft; empty when it can
     * @param notes     remarks that do not stop it (a new reference, a value far from the prediction)
     */
    record Row(int line, MeasuredCompound compound, List<String> sites, List<Double> predicted, List<String> problems,
            List<String> notes) {
        public Row {
            sites = List.copyOf(sites);
            predicted = List.copyOf(predicted);
            problems = List.copyOf(problems);
            notes = List.copyOf(notes);
        }

        public boolean ok() {
            return problems.isEmpty() && compound != null;
        }
    }

    /**
     * @param rows          every row, in file order
     * @param newReferences references made from source texts that were no reference id
     * @param draft         the head with the valid rows added (version: the next number, the head as parent,
     *                      empty hash)
     */
    record Result(List<Row> rows, List<Reference> newReferences, AcidityTable draft) {
        public Result {
            rows = List.copyOf(rows);
            newReferences = List.copyOf(newReferences);
        }

        /** Whether every row can go into the draft. */
        public boolean ok() {
            return rows.stream().allMatch(Row::ok);
        }
    }

    /** One prediction that a draft's measured compounds move through the analog correction. */
    record Move(String structure, String name, String site, double head, double draft, List<String> movedBy) {
        public Move {
            movedBy = List.copyOf(movedBy);
        }
    }

    Result read(String text, Format format, AcidityTable head, String author);

    /**
     * Site values that move between head and draft because of measured analogs: every compound of the
     * reference set and every given structure (a notebook's), largest move first, each with the measured
     * compounds that moved it.
     */
    List<Move> analogMoves(AcidityTable head, AcidityTable draft, List<String> structures);
}
