package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.List;

import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.api.SiteType;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.sites.MatchTarget;

/**
 * From estimated sites to the numeric microstate model: the bond paths between sites, the
 * charge-distance interaction of every pair, and the {@link SiteModel} at a temperature. Sites are
 * indexed titratable first, then permanent ({@link #inDistanceOrder}); one interaction matrix serves
 * every model built for a structure.
 */
public final class SiteInteractions {
    private final SiteInteraction rule;

    public SiteInteractions(SiteInteraction rule) {
        this.rule = rule;
    }

    /**
     * The charge-distance interaction for every pair of sites, indexed as {@link #distances}; 0 for a
     * pair with a site of a class the table exempts (its charge is already in the substituent constants),
     * times both sites' reach factors.
     */
    public double[][] interactions(int[][][] dist, List<EstimatedSite> est) {
        int k = dist.length;
        double[] reach = new double[k];
        List<EstimatedSite> ordered = inDistanceOrder(est);
        for (int i = 0; i < k; i++) {
            reach[i] = rule.reachOf(ordered.get(i).site().group().id());
        }
        double[][] w = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                w[i][j] = i == j || reach[i] == 0 || reach[j] == 0 ? 0 : SitePaths.interaction(rule, dist[i][j]) * reach[i] * reach[j];
            }
        }
        return w;
    }

    /**
     * The numeric model at the temperature (ionic strength comes after, on whole species): corrected site pKa values and the interactions
     * ({@code inter}, from {@link #interactions} and the pair rules for these sites).
     */
    public static SiteModel model(double[][] inter, List<EstimatedSite> est, Conditions c) {
        List<EstimatedSite> titr = new ArrayList<>(est.size());
        List<EstimatedSite> perm = new ArrayList<>(0);
        for (EstimatedSite s : est) {
            (s.site().group().permanent() ? perm : titr).add(s);
        }
        int n = titr.size();
        double[] pka = new double[n];
        boolean[] base = new boolean[n];
        for (int i = 0; i < n; i++) {
            GroupClass g = titr.get(i).site().group();
            base[i] = g.type() == SiteType.BASE;
            pka[i] = titr.get(i).pka() + Conditioning.temperatureShift(g.enthalpy(), c.temperature());
        }
        double[][] w = new double[n][n];
        double[] bg = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j) {
                    w[i][j] = inter[i][j];
                }
            }
            for (int p = 0; p < perm.size(); p++) {
                double q = perm.get(p).site().group().type() == SiteType.BASE ? 1 : -1;
                bg[i] += inter[i][n + p] * q;
            }
        }
        return new SiteModel(pka, base, w, bg);
    }

    /** Net permanent charge of the sites: +1 per permanent cation, −1 per permanent anion. */
    public static int permanentCharge(List<EstimatedSite> est) {
        int q = 0;
        for (EstimatedSite s : est) {
            if (s.site().group().permanent()) {
                q += s.site().group().type() == SiteType.BASE ? 1 : -1;
            }
        }
        return q;
    }

    /** The sites as {@link #distances} and {@link #interactions} index them: titratable first, then permanent. */
    static List<EstimatedSite> inDistanceOrder(List<EstimatedSite> est) {
        List<EstimatedSite> out = new ArrayList<>(est.size());
        est.stream().filter(s -> !s.site().group().permanent()).forEach(out::add);
        est.stream().filter(s -> s.site().group().permanent()).forEach(out::add);
        return out;
    }

    /** The bond paths between the sites' atoms ({@link SitePaths#between}), in {@link #inDistanceOrder}. */
    public static int[][][] distances(MatchTarget target, List<EstimatedSite> est) {
        int k = est.size();
        List<EstimatedSite> ordered = inDistanceOrder(est);
        int[][] adj = target.adjacency();
        boolean[] saturated = new boolean[adj.length];
        for (int i = 0; i < adj.length; i++) {
            saturated[i] = !target.aromatic(i);
            for (int n = 0; n < adj[i].length; n++) {
                saturated[i] &= target.bondCode(i, n) == 1;
            }
        }
        int[][][] out = new int[k][k][];
        for (int i = 0; i < k; i++) {
            for (int j = i; j < k; j++) {
                out[i][j] = SitePaths.between(adj, saturated, ordered.get(i).site().atom(), ordered.get(j).site().atom());
                out[j][i] = out[i][j];
            }
        }
        return out;
    }
}
