package ionmark.acidity.api;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * One immutable snapshot of the shared pKa table. Safe to share between threads; a change to the
 * table is a new snapshot, never a mutation of this one.
 */
public final class AcidityTable {
    private final TableVersion version;
    private final List<Reference> references;
    private final List<GroupClass> groups;
    private final List<Substituent> substituents;
    private final List<MeasuredCompound> measured;
    private final SiteInteraction interaction;
    private final List<PairRule> pairs;
    private final Map<String, ClassFit> fits;
    private final Map<String, Reference> referenceIndex;
    private final Map<String, GroupClass> groupIndex;

    public AcidityTable(TableVersion version, List<Reference> references, List<GroupClass> groups,
            List<Substituent> substituents, List<MeasuredCompound> measured, SiteInteraction interaction) {
        this(version, references, groups, substituents, measured, interaction, List.of());
    }

    /** A table with hydrogen-bonded pair rules on top of the charge-distance interaction. */
    public AcidityTable(TableVersion version, List<Reference> references, List<GroupClass> groups,
            List<Substituent> substituents, List<MeasuredCompound> measured, SiteInteraction interaction,
            List<PairRule> pairs) {
        this(version, references, groups, substituents, measured, interaction, pairs, Map.of());
    }

    /**
     * A table with the provenance of its fitted numbers: record id → fit (a pair rule's under
     * {@code "pair:" + id}). Since 1.4.
     */
    public AcidityTable(TableVersion version, List<Reference> references, List<GroupClass> groups,
            List<Substituent> substituents, List<MeasuredCompound> measured, SiteInteraction interaction,
            List<PairRule> pairs, Map<String, ClassFit> fits) {
        this.version = Objects.requireNonNull(version, "version");
        this.references = List.copyOf(references);
        this.groups = List.copyOf(groups);
        this.substituents = List.copyOf(substituents);
        this.measured = List.copyOf(measured);
        this.interaction = Objects.requireNonNull(interaction, "interaction");
        this.pairs = List.copyOf(pairs);
        this.fits = java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(fits == null ? Map.of() : fits));
        var r = new LinkedHashMap<String, Reference>();
        this.references.forEach(x -> r.putIfAbsent(x.id(), x));
        this.referenceIndex = Map.copyOf(r);
        var g = new LinkedHashMap<String, GroupClass>();
        this.groups.forEach(x -> g.putIfAbsent(x.id(), x));
        this.groupIndex = Map.copyOf(g);
    }

    public TableVersion version() { return version; }
    public List<Reference> references() { return references; }
    public List<GroupClass> groups() { return groups; }
    public List<Substituent> substituents() { return substituents; }
    public List<MeasuredCompound> measured() { return measured; }
    public SiteInteraction interaction() { return interaction; }
    /** Hydrogen-bonded pairs whose singly charged state the distance rule underrates. */
    public List<PairRule> pairs() { return pairs; }

    /** Provenance of fitted numbers by record id (pair rules under {@code "pair:" + id}). Since 1.4. */
    public Map<String, ClassFit> fits() { return fits; }

    /** The fit that set this record's numbers, if a calibration did. Since 1.4. */
    public Optional<ClassFit> fit(String recordId) {
        return Optional.ofNullable(fits.get(recordId));
    }

    public Optional<GroupClass> group(String id) {
        return Optional.ofNullable(groupIndex.get(id));
    }

    /** The full citation for a reference id, or the id itself when it is unknown. */
    public String citation(String referenceId) {
        Reference r = referenceIndex.get(referenceId);
        return r == null ? referenceId : r.citation();
    }

    /** A copy with other version metadata (content unchanged). */
    public AcidityTable withVersion(TableVersion v) {
        return new AcidityTable(v, references, groups, substituents, measured, interaction, pairs, fits);
    }

    /** A copy with other group classes (used by calibration and by admin drafts). */
    public AcidityTable withGroups(List<GroupClass> g) {
        return new AcidityTable(version, references, g, substituents, measured, interaction, pairs, fits);
    }

    /** A copy with other pair rules (used by calibration). */
    public AcidityTable withPairs(List<PairRule> p) {
        return new AcidityTable(version, references, groups, substituents, measured, interaction, p, fits);
    }

    /** A copy with another site-interaction rule (used by calibration). */
    public AcidityTable withInteraction(SiteInteraction si) {
        return new AcidityTable(version, references, groups, substituents, measured, si, pairs, fits);
    }

    /** A copy with other fit provenance. Since 1.4. */
    public AcidityTable withFits(Map<String, ClassFit> f) {
        return new AcidityTable(version, references, groups, substituents, measured, interaction, pairs, f);
    }

    /** A copy with other measured compounds (admin drafts). Since 1.4. */
    public AcidityTable withMeasured(List<MeasuredCompound> m) {
        return new AcidityTable(version, references, groups, substituents, m, interaction, pairs, fits);
    }

    /** A copy with other substituents (admin drafts). Since 1.4. */
    public AcidityTable withSubstituents(List<Substituent> s) {
        return new AcidityTable(version, references, groups, s, measured, interaction, pairs, fits);
    }

    /** A copy with other references. */
    public AcidityTable withReferences(List<Reference> r) {
        return new AcidityTable(version, r, groups, substituents, measured, interaction, pairs, fits);
    }
}
