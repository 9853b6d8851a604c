package ionmark.notebook.internal;

import java.util.List;
import java.util.Locale;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Species;
import ionmark.speciation.api.Term;

/**
 * The annotation card, a toolkit-neutral model (analysis at each stated pH, the words the
 * conditions came from, a protonation curve) rendered to HTML and SVG for the web host.
 *
 * @param analyses  one analysis per pH (two for a stated range), or one without pH
 * @param taken     the words each condition was read from ("pH 7.4" in block 3 …), empty when none
 * @param curve     site protonation over pH 0–14, or null when the structure could not be read
 */
record Card(List<Analysis> analyses, List<String> taken, Curve curve) {
    static final String CAUTION = "Estimates for planning and write-up. Verify experimentally where safety or "
            + "regulatory decisions depend on them.";

    String html() {
        StringBuilder sb = new StringBuilder("<section class=\"im-card\" tabindex=\"0\">");
        Analysis first = analyses.get(0);
        if (!first.ok()) {
            sb.append("<p class=\"im-error\" role=\"alert\">Cannot annotate: ").append(Html.esc(first.error()))
                    .append("</p></section>");
            return sb.toString();
        }
        sb.append("<div class=\"im-drawing\">").append(Depiction.svg(first)).append("</div>");
        if (taken.isEmpty()) {
            sb.append("<p class=\"im-cond\">No pH found in this entry: site pKa values only.</p>");
        } else {
            sb.append("<p class=\"im-cond\">Conditions taken from: ");
            for (int i = 0; i < taken.size(); i++) {
                sb.append(i > 0 ? "; " : "").append("<q>").append(Html.esc(taken.get(i))).append("</q>");
            }
            sb.append("</p>");
        }
        for (Analysis a : analyses) {
            sb.append(sites(a));
            sb.append(summary(a));
        }
        if (curve != null) {
            sb.append(Plot.svg(curve, first));
        }
        sb.append("<ul class=\"im-warn\">");
        for (String w : first.warnings()) {
            sb.append("<li>").append(Html.esc(w)).append("</li>");
        }
        sb.append("</ul><p class=\"im-caution\">").append(Html.esc(CAUTION)).append(" Table ")
                .append(Html.esc(first.tableVersion())).append(".</p></section>");
        return sb.toString();
    }

    private static String sites(Analysis a) {
        StringBuilder sb = new StringBuilder("<table class=\"im-sites\"><caption>")
                .append(a.conditions().hasPh() ? "Sites at pH " + StatedConditions.format(a.conditions().ph())
                        : "Sites (no pH)")
                .append("</caption><thead><tr><th>atom</th><th>site</th><th>kind</th><th>pKa</th><th>±</th>"
                        + "<th>protonated</th><th>basis</th></tr></thead><tbody>");
        for (Site s : a.sites()) {
            sb.append("<tr><td>").append(s.atom()).append(' ').append(Html.esc(s.element())).append("</td><td>")
                    .append("<details><summary>").append(Html.esc(s.groupName())).append("</summary><ol>");
            for (Term t : s.derivation()) {
                sb.append("<li>").append(String.format(Locale.ROOT, "%+.2f ", t.value())).append(Html.esc(t.label()))
                        .append(" <cite>").append(Html.esc(t.source())).append("</cite></li>");
            }
            sb.append("</ol></details></td><td>").append(s.type().equals("acid") ? "■ acid" : "● base")
                    .append("</td><td>").append(s.permanent() ? "fixed" : fmt(s.pka())).append("</td><td>")
                    .append(s.permanent() ? "" : fmt(s.sd())).append("</td><td>")
                    .append(s.protonated() == null ? "–" : String.format(Locale.ROOT, "%.1f %%", 100 * s.protonated()))
                    .append("</td><td>").append(Html.esc(s.basis())).append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    private static String summary(Analysis a) {
        StringBuilder sb = new StringBuilder("<p class=\"im-summary\">macroscopic pKa ");
        sb.append(a.macroPka().isEmpty() ? "none in −2…16" : Html.esc(a.macroPka().toString()));
        if (a.netCharge() != null) {
            sb.append(String.format(Locale.ROOT, "; net charge %+.2f; neutral %.1f %%", a.netCharge(),
                    100 * a.fractionNeutral()));
            if (a.logD() != null) {
                sb.append(String.format(Locale.ROOT, "; logD %.2f (logP %.2f)", a.logD(), a.logP()));
            }
            sb.append("</p><ul class=\"im-species\">");
            for (Species s : a.species()) {
                if (s.fraction() >= 0.01) {
                    sb.append("<li>").append(String.format(Locale.ROOT, "%.1f %% charge %+d ", 100 * s.fraction(),
                            s.charge())).append("<code>").append(Html.esc(s.smiles())).append("</code></li>");
                }
            }
            sb.append("</ul>");
        } else {
            sb.append("</p>");
        }
        return sb.toString();
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
