package ionmark.speciation.api;

import java.util.List;

import org.osgi.annotation.versioning.ProviderType;

import ionmark.acidity.api.AcidityTable;

/**
 * What a draft table would change: every compound of the project's reference set (handbook values,
 * shipped with this bundle) predicted with the head and with the draft.
 */
@ProviderType
public interface TableRegression {

    /** One reference compound whose prediction changes. */
    record Shift(String name, String smiles, List<Double> reference, List<Double> head, List<Double> draft,
            List<String> sitesGained, List<String> sitesLost, double largestShift) {
        public Shift {
            reference = List.copyOf(reference);
            head = List.copyOf(head);
            draft = List.copyOf(draft);
            sitesGained = List.copyOf(sitesGained);
            sitesLost = List.copyOf(sitesLost);
        }
    }

    /**
     * @param compounds     reference compounds predicted
     * @param maeHead       mean absolute error against the reference values with the head
     * @param maeDraft      the same with the draft
     * @param classesTouched group classes (and substituents) that differ between head and draft
     * @param shifts        compounds whose prediction changes, largest change first
     */
    record Report(int compounds, double maeHead, double maeDraft, List<String> classesTouched, List<Shift> shifts) {
        public Report {
            classesTouched = List.copyOf(classesTouched);
            shifts = List.copyOf(shifts);
        }
    }

    Report compare(AcidityTable head, AcidityTable draft);
}
