package ionmark.console.internal;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Term;
import ionmark.speciation.api.Basis;

/**
 * Whether the analog step fires, read from the derivations of a set of predictions made with and without
 * the added measurements: how many titratable sites got measured analogs, how many analogs, how similar the
 * nearest one, their summed weight and the shift. It also checks the promise made to everything else: a
 * compound none of whose sites has a measured analog comes out byte-identical in JSON (apart from the table
 * version) with and without the measurements.
 */
final class AnalogFiring {
    /** The derivation line {@code AnalogCorrection} writes per analog. */
    static final String LINE = "measured analog ";
    private static final Pattern NUMBERS = Pattern.compile(
            "local similarity (-?[0-9.]+)(?:, whole-molecule similarity (-?[0-9.]+))?, weight (-?[0-9.]+) of (-?[0-9.]+) \\(prior (-?[0-9.]+)\\)");

    /**
     * @param sites      titratable sites predicted
     * @param corrected  sites with at least one measured analog
     * @param analogs    mean analogs per corrected site
     * @param similarity mean local similarity of a corrected site's nearest analog (the one of largest weight)
     * @param whole      mean whole-molecule similarity of that analog (NaN when the settings compare sites only)
     * @param weight     mean summed weight per corrected site
     * @param shift      mean absolute shift of a corrected site
     * @param untouched  compounds with no analog at any site
     * @param identical  of those, compounds whose JSON is byte-identical apart from the table version
     * @param exact      compounds that are a measured compound (same constitution), not counted above
     */
    record Stats(int sites, int corrected, double analogs, double similarity, double whole, double weight,
            double shift, int untouched, int identical, int exact, List<String> differences) {
        String line() {
            // the nearest analog is the one of largest weight: with a whole-molecule share its weight comes from the
            // blend of both similarities, so both are printed
            String nearest = Double.isNaN(whole)
                    ? String.format(Locale.ROOT, "nearest analog's similarity %.2f", similarity)
                    : String.format(Locale.ROOT, "nearest analog's local similarity %.2f and whole-molecule similarity %.2f",
                            similarity, whole);
            return String.format(Locale.ROOT, "  analogs fired at %d of %d predicted sites (%.0f %%); per corrected site: "
                    + "%.1f analogs, %s, summed weight %.2f, |shift| %.2f; %d compounds without "
                    + "analogs, %d of them byte-identical in JSON; %d matched a measured compound's constitution",
                    corrected, sites, 100.0 * corrected / Math.max(1, sites), analogs, nearest, weight, shift, untouched,
                    identical, exact);
        }
    }

    private AnalogFiring() {
    }

    static Stats of(List<Analysis> before, List<Analysis> after) {
        int sites = 0;
        int corrected = 0;
        int analogs = 0;
        double sim = 0;
        double whole = 0;
        int wholeSites = 0;
        double weight = 0;
        double shift = 0;
        int untouched = 0;
        int identical = 0;
        List<String> differences = new java.util.ArrayList<>();
        int exact = 0;
        for (int i = 0; i < after.size(); i++) {
            Analysis a = after.get(i);
            if (!a.ok()) {
                continue;
            }
            if (a.sites().stream().anyMatch(s -> s.basis() == Basis.MEASURED)) {
                exact++; // the same constitution as a measured compound (a stereoisomer, a salt): its values, not analogs
                continue;
            }
            boolean any = false;
            for (Site s : a.sites()) {
                if (s.permanent()) {
                    continue;
                }
                sites++;
                List<Term> lines = s.derivation().stream().filter(t -> t.label().startsWith(LINE)).toList();
                if (lines.isEmpty()) {
                    continue;
                }
                any = true;
                corrected++;
                analogs += lines.size();
                Nearest n = nearest(lines);
                sim += n.local();
                if (!Double.isNaN(n.whole())) {
                    whole += n.whole();
                    wholeSites++;
                }
                double w = n.summed();
                weight += w;
                shift += Math.abs(lines.stream().mapToDouble(Term::value).sum());
            }
            if (!any) {
                untouched++;
                String b = json(before.get(i));
                String x = json(a);
                if (b.equals(x)) {
                    identical++;
                } else if (differences.size() < 5) {
                    int at = 0;
                    while (at < Math.min(b.length(), x.length()) && b.charAt(at) == x.charAt(at)) {
                        at++;
                    }
                    int from = Math.max(0, at - 80);
                    differences.add(a.input() + ": without " + b.substring(from, Math.min(b.length(), at + 80))
                            + "\n    with    " + x.substring(from, Math.min(x.length(), at + 80)));
                }
            }
        }
        int c = Math.max(1, corrected);
        // both means over the same sites: the whole-molecule one only when every nearest analog printed it
        return new Stats(sites, corrected, (double) analogs / c, sim / c, wholeSites == 0 || wholeSites != corrected
                ? Double.NaN : whole / wholeSites,
                weight / c, shift / c, untouched, identical, exact, List.copyOf(differences));
    }

    /**
     * A site's nearest analog, the one of largest weight (with a whole-molecule share the weight comes from the blend,
     * not from the local similarity alone): its local and whole-molecule similarity (NaN when not printed), and the
     * summed weight of all the site's analog lines.
     */
    record Nearest(double local, double whole, double summed) {
    }

    static Nearest nearest(List<Term> lines) {
        double top = -1;
        double local = 0;
        double mol = Double.NaN;
        double w = 0;
        for (Term t : lines) {
            Matcher m = NUMBERS.matcher(t.label());
            if (m.find()) {
                double wi = Double.parseDouble(m.group(3));
                if (wi > top) {
                    top = wi;
                    local = Double.parseDouble(m.group(1));
                    mol = m.group(2) == null ? Double.NaN : Double.parseDouble(m.group(2));
                }
                w += wi;
            }
        }
        return new Nearest(local, mol, w);
    }

    /** The brief JSON of an analysis without its table version. */
    static String json(Analysis a) {
        ObjectNode o = AnalysisJson.of(null, a, true);
        o.remove("tableVersion");
        return o.toString();
    }
}
