package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.SiteType;

/**
 * The measured sites of one table snapshot, by class family: each measured compound's macroscopic
 * values assigned to its sites through the model (as an exact match is fitted), giving per site the
 * residual measured − model and the site's local environment. Built once per snapshot; immutable.
 */
public final class SiteAnalogIndex {
    /** Residuals beyond this are left out: a fit that far off says more about the assignment than the site. */
    static final double MAX_RESIDUAL = 5.0;

    /**
     * One measured site.
     *
     * @param compound the measured compound
     * @param group    class id of the site
     * @param type     acid or base
     * @param env      local environment ({@link SiteEnvironment}) at the index's radius
     * @param model    the model's site value before the measured values were fitted
     * @param residual measured − model at this site
     * @param citation full citation of the measured value's source
     * @param held     the pair rules that hold the site ({@link AnalogCorrection#heldBy}), empty when none
     * @param share    the site's share of the model step the residual belongs to: a factor on its analog weight (1
     *                 when the whole residual is this site's)
     * @param molecule the whole measured molecule's features ({@link SiteEnvironment#molecule}); empty when the index
     *                 does not compare whole molecules, and such a site is then compared by its environment alone
     */
    public record MeasuredSite(MeasuredCompound compound, String group, SiteType type, int[] env, double model,
            double residual, String citation, String held, double share, int[] molecule) {
        /** A site of an index that compares local environments only. */
        public MeasuredSite(MeasuredCompound compound, String group, SiteType type, int[] env, double model,
                double residual, String citation, String held, double share) {
            this(compound, group, type, env, model, residual, citation, held, share, new int[0]);
        }

        /** A site that takes the whole residual. */
        public MeasuredSite(MeasuredCompound compound, String group, SiteType type, int[] env, double model,
                double residual, String citation, String held) {
            this(compound, group, type, env, model, residual, citation, held, 1, new int[0]);
        }
    }

    public static final SiteAnalogIndex EMPTY = new SiteAnalogIndex(List.of(), AnalogSettings.DEFAULT);

    private final Map<String, List<MeasuredSite>> byFamily = new HashMap<>();
    /** The candidates of {@link #candidates}, by family, type and holding pair rules, in the family's order. */
    private final Map<String, List<MeasuredSite>> byKey = new HashMap<>();
    private final AnalogSettings settings;
    private final int size;

    public SiteAnalogIndex(List<MeasuredSite> sites, AnalogSettings settings) {
        this.settings = settings;
        int n = 0;
        for (MeasuredSite s : sites) {
            if (Math.abs(s.residual()) <= MAX_RESIDUAL && !Double.isNaN(s.residual())) {
                byFamily.computeIfAbsent(family(s.group()), k -> new ArrayList<>()).add(s);
                n++;
            }
        }
        byFamily.replaceAll((k, v) -> List.copyOf(v));
        byFamily.forEach((family, all) -> {
            for (MeasuredSite s : all) {
                byKey.computeIfAbsent(key(family, s.type(), s.held()), k -> new ArrayList<>()).add(s);
            }
        });
        byKey.replaceAll((k, v) -> List.copyOf(v));
        this.size = n;
    }

    public AnalogSettings settings() {
        return settings;
    }

    /** Number of measured sites held. */
    public int size() {
        return size;
    }

    /**
     * Measured sites of the same family and type as {@code g} (the same class among them) that are held by the
     * same pair rules ({@link AnalogCorrection#heldBy}), in the index's order; looked up, not filtered per call.
     */
    public List<MeasuredSite> candidates(GroupClass g, String held) {
        return byKey.getOrDefault(key(family(g.id()), g.type(), held), List.of());
    }

    private static String key(String family, SiteType type, String held) {
        return family + '\u0000' + type + '\u0000' + held;
    }

    /** A class's family: its id up to the first hyphen ({@code amine-tertiary} → {@code amine}). */
    public static String family(String groupId) {
        int dash = groupId.indexOf('-');
        return dash < 0 ? groupId : groupId.substring(0, dash);
    }
}
