package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Relation;
import ionmark.acidity.api.Substituent;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.sites.PerceivedSite;

/**
 * Site pKa by linear free-energy relations.
 *
 * <ul>
 * <li>Hammett (aromatic sites): ΔpKa = −ρ Σσ over substituents on the ring that carries the
 * centre; meta σm, para σp (σp⁻ or σp⁺ when the class is in through-resonance); ortho by the
 * stated rule σo = f·σp + σI, f the class's ortho factor; in five-membered rings the adjacent
 * position counts as ortho and the next as meta. An aromatic ring fused to the site's ring is
 * part of the class (quinoline, naphthol), not a substituent; a substituent on that fused ring
 * acts through the ring system, σp at an odd and σm at an even number of bonds from the centre,
 * scaled by one transmission factor; an atom of a fused saturated ring is a substituent like any
 * other (the N of a tetrahydronaphthyridine acts as an amino group).</li>
 * <li>Taft/inductive (sp3 paths): ΔpKa = −ρ Σ σI·a^(n−1), n the bonds from a centre to the
 * substituent's attachment atom, a the class's attenuation per bond; saturated carbons transmit,
 * every other atom is a substituent. Paths are counted from each centre without passing back
 * through the site group, so a ring transmits both ways. Several substituents on one atom count
 * 1, 0.75, 0.55 (saturation, common practice).</li>
 * </ul>
 * Equivalent sites are separate sites; their statistical factors come out of the microstate sum.
 */
public final class LferEstimator {
    static final int MAX_PATH = 5;
    /** How a substituent's path length is written in a derivation, by bonds from the centre. */
    private static final String[] PATH = {" (n=0)", " (n=1)", " (n=2)", " (n=3)", " (n=4)", " (n=5)"};
    private static final double[] SATURATION = {1.0, 0.75, 0.55, 0.45};
    /** Added in quadrature per unit |correction|: a large correction is less certain (common practice). */
    static final double SD_PER_UNIT_CORRECTION = 0.12;
    /**
     * Share of a substituent's σ that reaches the site from an aromatic ring fused to the site's ring
     * (cross-validated against 0.5 when it was introduced; with table v28's base, 0.4 gave 81.7 % / MAE 0.604 /
     * RMSE 1.016 and 0.2 gave 81.3 % / 0.609 / 1.015, against 81.7 % / 0.604 / 1.020: no reason to move it).
     */
    static final double FUSED_TRANSMISSION = 0.3;
    /**
     * The factor is one number for every class: 0.3 and 0.5 were compared by 5-fold cross-validation
     * of the whole calibration (within 1.0: 76.0 % and 75.8 %; none: 75.8 %).
     */
    private static final String FUSED_SOURCE = "one factor for all classes, chosen by cross-validation on the"
            + " development set";

    /**
     * Substituents that act on a ring partly through π overlap and lose it when turned out of the ring plane:
     * nitro, alkoxy and aryloxy, dialkylamino, and carbonyl groups. Between two ortho neighbours such a group
     * takes σm in place of σp (and in the ortho rule), the steric inhibition of resonance (Wepster).
     */
    static final java.util.Set<String> TWISTABLE = java.util.Set.of("nitro", "nitro-neutral", "methoxy", "alkoxy",
            "phenoxy", "dimethylamino", "dialkylamino", "formyl", "acetyl", "acyl", "benzoyl", "carboxy",
            "methoxycarbonyl", "carbamoyl", "amido");
    private static final String TWISTED = " (turned out of the ring plane by two ortho neighbours: σm)";
    private static final String TWIST_SOURCE = "steric inhibition of resonance: 3,5-dimethyl-4-nitrophenol 8.25"
            + " against 7.15 for 4-nitrophenol and 7.22 for 2,6-dimethyl-4-nitrophenol (March's Advanced Organic"
            + " Chemistry, acids and bases chapter, from memory); σm for the twisted group is an Ionmark rule";

    private LferEstimator() {
    }

    public static List<EstimatedSite> estimate(CompiledTable table, IAtomContainer mol, List<PerceivedSite> sites) {
        return estimate(table, mol, new MatchTarget(mol), sites);
    }

    /** {@code target} is {@code mol} as arrays, shared with site perception. */
    public static List<EstimatedSite> estimate(CompiledTable table, IAtomContainer mol, MatchTarget target,
            List<PerceivedSite> sites) {
        SubstituentMap subs = new SubstituentMap(table, target);
        int[][] rings = null; // found when the first Hammett site asks
        List<EstimatedSite> out = new ArrayList<>();
        for (PerceivedSite s : sites) {
            if (rings == null && s.group().relation() == Relation.HAMMETT && mol.getAtom(s.centres()[0]).isInRing()) {
                rings = target.rings();
            }
            out.add(estimate(table.table(), target, subs, rings, s));
        }
        return out;
    }

    private static EstimatedSite estimate(AcidityTable t, MatchTarget mol, SubstituentMap subs, int[][] rings,
            PerceivedSite s) {
        GroupClass g = s.group();
        List<Term> terms = new ArrayList<>();
        terms.add(new Term("class " + g.name() + " (" + g.id() + ")", g.pka(), t.citation(g.source("pka"))));
        double total = 0;
        if (g.relation() == Relation.HAMMETT) {
            total = hammett(t, mol, subs, rings, s, terms);
        } else if (g.relation() == Relation.TAFT) {
            total = taft(t, mol, subs, s, terms);
        }
        double sd = Math.sqrt(g.sd() * g.sd() + Math.pow(SD_PER_UNIT_CORRECTION * Math.abs(total), 2)
                + TailTerm.variance(total, t.fit(g.id())));
        return new EstimatedSite(s, g.pka() + total, sd, terms, ionmark.speciation.api.Basis.ESTIMATED);
    }

    // ------------------------------------------------------------------ Hammett

    private static double hammett(AcidityTable t, MatchTarget mol, SubstituentMap subs, int[][] rings,
            PerceivedSite s, List<Term> terms) {
        GroupClass g = s.group();
        int centre = s.centres()[0];
        int[] ring = rings == null ? null : ringOf(rings, centre); // null: the centre is in no ring
        if (ring == null) {
            return 0;
        }
        int size = ring.length - 1; // a closed path: the first atom again at the end
        boolean[] inRing = new boolean[mol.atomCount()];
        for (int i = 0; i < size; i++) {
            inRing[ring[i]] = true;
        }
        int centreIdx = indexIn(ring, centre);
        double f = Double.isNaN(g.attenuation()) ? 0.5 : g.attenuation();
        double total = 0;
        boolean[] forbidden = inRing.clone();
        for (int a : s.core()) {
            forbidden[a] = true;
        }
        for (int i = 0; i < size; i++) {
            int r = ring[i];
            if (r == centre) {
                continue;
            }
            int d = Math.abs(i - centreIdx);
            d = Math.min(d, size - d);
            for (int x : mol.adjacency()[r]) {
                if (inRing[x] || s.inCore(x) || mol.aromatic(x) && isFusedNeighbour(rings, r, x)) {
                    continue;
                }
                SubstituentMap.Hit h = subs.at(x, forbidden);
                if (h == null) {
                    continue;
                }
                Substituent sub = h.sub().substituent();
                // a π-donor or acceptor between two ortho neighbours is turned out of the ring plane: no resonance
                boolean twisted = d != 2 && size == 6 && TWISTABLE.contains(sub.id())
                        && !Double.isNaN(sub.sigmaMeta()) && flanked(mol, rings, ring, i, size, inRing);
                String pos;
                double sigma;
                if (d == 1) {
                    pos = "ortho";
                    double sp = twisted ? sub.sigmaMeta() : sub.sigmaPara(g.resonance());
                    double si = Double.isNaN(sub.sigmaI()) ? 0 : sub.sigmaI();
                    sigma = (Double.isNaN(sp) ? 0 : f * sp) + si;
                } else if (d == 2 || size == 5 || twisted) {
                    pos = d == 2 || size == 5 ? "meta" : "para";
                    sigma = sub.sigmaMeta();
                } else {
                    pos = "para";
                    sigma = sub.sigmaPara(g.resonance());
                }
                if (Double.isNaN(sigma)) {
                    continue;
                }
                double delta = -g.rho() * sigma;
                total += delta;
                String sym = d == 1 ? "σo = " + fmt(f) + (twisted ? "·σm + σI" : "·σp + σI")
                        : (d == 3 && size == 6 && !twisted ? "σ" + g.resonance().code() : "σm");
                String source = t.citation(sub.source(d == 2 || size == 5 || twisted ? "sigmaMeta" : "sigmaPara"))
                        + "; ρ: " + t.citation(g.source("rho"));
                terms.add(new Term("Hammett " + pos + " " + sub.name() + (twisted ? TWISTED : "") + ": " + sym + " "
                        + fmt(sigma) + " × ρ " + fmt(g.rho()), delta, twisted ? source + "; " + TWIST_SOURCE : source));
            }
        }
        return total + fused(t, mol, subs, rings, s, ring, inRing, terms);
    }

    /**
     * Substituents on an aromatic ring fused to the site's ring (the benzo ring of a quinoline, the
     * second ring of a naphthol). Positions at an odd number of bonds from the centre through the
     * ring system are conjugated with it (σp, or σp⁻/σp⁺ where the class is in through-resonance), at
     * an even number not (σm); either is scaled by {@link #FUSED_TRANSMISSION}.
     */
    private static double fused(AcidityTable t, MatchTarget mol, SubstituentMap subs, int[][] rings,
            PerceivedSite s, int[] ring, boolean[] inRing, List<Term> terms) {
        GroupClass g = s.group();
        int centre = s.centres()[0];
        double total = 0;
        boolean[] seen = null;
        for (int[] other : rings) {
            if (other == ring || !fusedAromatic(mol, other, inRing)) {
                continue;
            }
            boolean[] system = inRing.clone();
            for (int a : other) {
                system[a] = true;
            }
            int[] dist = distancesWithin(mol, system, centre);
            boolean[] forbidden = system.clone();
            for (int a : s.core()) {
                forbidden[a] = true;
            }
            for (int i = 0; i < other.length - 1; i++) {
                int r = other[i];
                if (inRing[r] || dist[r] < 0) {
                    continue;
                }
                for (int x : mol.adjacency()[r]) {
                    if (system[x] || s.inCore(x) || mol.aromatic(x) && isFusedNeighbour(rings, r, x)) {
                        continue;
                    }
                    if (seen == null) {
                        seen = new boolean[mol.atomCount()];
                    }
                    if (seen[x]) {
                        continue;
                    }
                    SubstituentMap.Hit h = subs.at(x, forbidden);
                    if (h == null) {
                        continue;
                    }
                    seen[x] = true;
                    Substituent sub = h.sub().substituent();
                    boolean conjugated = dist[r] % 2 == 1;
                    double sigma = conjugated ? sub.sigmaPara(g.resonance()) : sub.sigmaMeta();
                    if (Double.isNaN(sigma)) {
                        continue;
                    }
                    double delta = -g.rho() * FUSED_TRANSMISSION * sigma;
                    total += delta;
                    terms.add(new Term("Hammett fused ring " + sub.name() + " (n=" + dist[r] + "): "
                            + fmt(FUSED_TRANSMISSION) + " × " + (conjugated ? "σ" + g.resonance().code() : "σm") + " "
                            + fmt(sigma) + " × ρ " + fmt(g.rho()), delta,
                            t.citation(sub.source(conjugated ? "sigmaPara" : "sigmaMeta")) + "; ρ: "
                                    + t.citation(g.source("rho")) + "; transmission: " + FUSED_SOURCE));
                }
            }
        }
        return total;
    }

    /** Whether {@code ring} (a closed path) is aromatic and shares a bond with the ring marked in {@code inRing}. */
    private static boolean fusedAromatic(MatchTarget mol, int[] ring, boolean[] inRing) {
        int shared = 0;
        for (int i = 0; i < ring.length - 1; i++) {
            if (!mol.aromatic(ring[i])) {
                return false;
            }
            if (inRing[ring[i]]) {
                shared++;
            }
        }
        return shared >= 2 && shared < ring.length - 1;
    }

    /** Bonds from {@code from} to each atom of {@code within}, through those atoms only; -1 elsewhere. */
    private static int[] distancesWithin(MatchTarget mol, boolean[] within, int from) {
        int[] dist = new int[mol.atomCount()];
        Arrays.fill(dist, -1);
        int[] queue = new int[dist.length];
        dist[from] = 0;
        queue[0] = from;
        for (int head = 0, tail = 1; head < tail; head++) {
            int u = queue[head];
            for (int x : mol.adjacency()[u]) {
                if (within[x] && dist[x] < 0) {
                    dist[x] = dist[u] + 1;
                    queue[tail++] = x;
                }
            }
        }
        return dist;
    }

    /**
     * Whether the ring atom {@code ring[i]} has, on both ring neighbours, a bulky exocyclic group, so that a planar π
     * substituent on it cannot stay in the ring plane. Bulky: a carbon (alkyl, aryl, carbonyl, also the atom of a
     * saturated ring fused there and the site's own carboxyl or CH2), Cl, Br, I, or an N, S or P that carries a
     * further heavy atom (nitro, dialkylamino, sulfonyl). Not bulky: hydrogen, F, O (hydroxy, alkoxy), a bare NH2, and
     * the atoms of an aromatic ring fused there.
     */
    private static boolean flanked(MatchTarget mol, int[][] rings, int[] ring, int i, int size, boolean[] inRing) {
        for (int n : new int[] {ring[(i + size - 1) % size], ring[(i + 1) % size]}) {
            boolean bulky = false;
            for (int y : mol.adjacency()[n]) {
                if (!inRing[y] && !(mol.aromatic(y) && isFusedNeighbour(rings, n, y)) && bulky(mol, y, n)) {
                    bulky = true;
                    break;
                }
            }
            if (!bulky) {
                return false;
            }
        }
        return true;
    }

    private static boolean bulky(MatchTarget mol, int y, int from) {
        switch (mol.atomicNumber(y)) {
            case 6, 17, 35, 53:
                return true;
            case 7, 15, 16:
                for (int z : mol.adjacency()[y]) {
                    if (z != from && mol.atomicNumber(z) != 1) {
                        return true;
                    }
                }
                return false;
            default:
                return false;
        }
    }

    private static boolean isFusedNeighbour(int[][] rings, int r, int x) {
        for (int[] ring : rings) {
            boolean hasR = false;
            boolean hasX = false;
            for (int a : ring) {
                hasR |= a == r;
                hasX |= a == x;
            }
            if (hasR && hasX) {
                return true; // x is in another ring fused at r
            }
        }
        return false;
    }

    private static int[] ringOf(int[][] rings, int atom) {
        int[] best = null;
        for (int[] r : rings) {
            if (indexIn(r, atom) >= 0 && (best == null || Math.abs(r.length - 7) < Math.abs(best.length - 7))) {
                best = r;
            }
        }
        return best;
    }

    private static int indexIn(int[] path, int atom) {
        for (int i = 0; i < path.length - 1; i++) {
            if (path[i] == atom) {
                return i;
            }
        }
        return -1;
    }

    // ------------------------------------------------------------------ Taft / inductive

    private static double taft(AcidityTable t, MatchTarget mol, SubstituentMap subs, PerceivedSite s,
            List<Term> terms) {
        GroupClass g = s.group();
        double a = Double.isNaN(g.attenuation()) ? 0.45 : g.attenuation();
        int n = mol.atomCount();
        // paths leave the site group only from its centres; a substituent may not run into the group
        boolean[] forbidden = new boolean[n];
        for (int c : s.core()) {
            forbidden[c] = true;
        }
        boolean[] blocked = forbidden.clone();
        for (int c : s.centres()) {
            blocked[c] = false;
        }
        double sum = 0;
        List<String> parts = new ArrayList<>();
        java.util.Set<String> sigmaSources = new java.util.LinkedHashSet<>();
        int[] dist = new int[n];
        int[] queue = new int[n];
        for (int c : s.centres()) {
            Arrays.fill(dist, -1);
            dist[c] = 0;
            queue[0] = c;
            // substituents found, with the skeleton atom each hangs on, for the saturation rule
            List<Inductive> found = null;
            for (int head = 0, tail = 1; head < tail; head++) {
                int u = queue[head];
                for (int x : mol.adjacency()[u]) {
                    if (dist[x] >= 0 || blocked[x]) {
                        continue;
                    }
                    dist[x] = dist[u] + 1;
                    if (dist[x] > MAX_PATH) {
                        continue;
                    }
                    if (mol.saturatedCarbon(x)) {
                        queue[tail++] = x;
                        continue;
                    }
                    // the substituent may not run back through the skeleton atom it hangs on
                    boolean was = forbidden[u];
                    forbidden[u] = true;
                    SubstituentMap.Hit h = subs.at(x, forbidden);
                    forbidden[u] = was;
                    if (h == null || Double.isNaN(h.sub().substituent().sigmaI())) {
                        continue;
                    }
                    if (found == null) {
                        found = new ArrayList<>(4);
                    }
                    found.add(new Inductive(u, h.sub().substituent(), Math.pow(a, dist[x] - 1), dist[x]));
                }
            }
            if (found == null) {
                continue;
            }
            for (Inductive f : found) {
                sigmaSources.add(f.sub().source("sigmaI"));
            }
            // per skeleton atom, in atom order: the strongest first for the saturation rule, names as found
            int[] on = found.stream().mapToInt(Inductive::on).distinct().sorted().toArray();
            for (int atom : on) {
                List<Inductive> here = new ArrayList<>(2);
                for (Inductive f : found) {
                    if (f.on() == atom) {
                        here.add(f);
                        parts.add(f.sub().name() + PATH[f.path()]);
                    }
                }
                here.sort((p, q) -> Double.compare(Math.abs(q.sub().sigmaI()), Math.abs(p.sub().sigmaI())));
                for (int i = 0; i < here.size(); i++) {
                    sum += here.get(i).sub().sigmaI() * here.get(i).weight()
                            * SATURATION[Math.min(i, SATURATION.length - 1)];
                }
            }
        }
        if (parts.isEmpty()) {
            return 0;
        }
        double delta = -g.rho() * sum;
        terms.add(new Term("inductive Σ σI·" + fmt(a) + "^(n−1) = " + fixed(sum, 3) + " × ρ " + fmt(g.rho()) + " from "
                + String.join(", ", parts), delta, "σI: " + sigmaSources.stream().map(t::citation)
                        .collect(java.util.stream.Collectors.joining("; ")) + "; ρ: " + t.citation(g.source("rho"))));
        return delta;
    }

    /** A substituent the inductive term found: the skeleton atom it hangs on, its weight and path length. */
    private record Inductive(int on, Substituent sub, double weight, int path) {
    }

    private static String fmt(double v) {
        return fixed(v, 2);
    }

    /**
     * {@code v} with {@code digits} decimals, rounded half away from zero, as {@code %.2f} would
     * print it in the root locale; derivations are built for every site of every molecule, and the
     * general formatter was a visible share of that.
     */
    static String fixed(double v, int digits) {
        if (Double.isNaN(v) || Double.isInfinite(v) || Math.abs(v) > 1e12) {
            return String.format(Locale.ROOT, "%." + digits + "f", v);
        }
        long scale = digits == 3 ? 1000 : digits == 2 ? 100 : (long) Math.pow(10, digits);
        long r = Math.round(Math.abs(v) * scale);
        StringBuilder sb = new StringBuilder(12);
        if (v < 0 && r != 0) {
            sb.append('-');
        }
        sb.append(r / scale).append('.');
        String frac = Long.toString(r % scale);
        for (int i = frac.length(); i < digits; i++) {
            sb.append('0');
        }
        return sb.append(frac).toString();
    }
}
