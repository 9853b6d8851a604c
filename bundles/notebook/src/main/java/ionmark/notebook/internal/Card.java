package ionmark.notebook.internal;

import java.util.List;
import java.util.Locale;

import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.ConditionsUsed;
import ionmark.notebook.api.Partition;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Species;
import ionmark.speciation.api.Term;
import ionmark.acidity.api.SiteType;

/**
 * The annotation card of one structure, rendered to HTML and SVG for the web host from the same
 * {@link AnnotatedStructure} that {@code ionmark annotate} prints.
 */
record Card(AnnotatedStructure s) {
    static final String CAUTION = "Estimates for planning and write-up. Verify experimentally where safety or "
            + "regulatory decisions depend on them.";

    String html() {
        StringBuilder sb = new StringBuilder("<section class=\"im-card\" tabindex=\"0\">");
        sb.append("<header class=\"im-cardhead\"><span class=\"im-src\">").append(Html.esc(sourceName()))
                .append("</span> <q class=\"im-words\">").append(Html.esc(abbreviate(s.words()))).append("</q></header>");
        if (s.source().equals("name") && s.error() == null) {
            sb.append("<p class=\"im-fromname\">Structure read from the chemical name (by OPSIN): <code>")
                    .append(Html.esc(s.structure())).append("</code>. Check that it is the compound you meant.</p>");
        }
        sb.append(conditions(s.conditions()));
        if (!s.ok()) {
            String error = s.error() != null ? s.error() : s.analyses().get(0).error();
            // a refusal for time or load already says "not annotated"
            String shown = error != null && error.startsWith("not annotated") ? "N" + error.substring(1)
                    : "Cannot annotate: " + error;
            sb.append("<p class=\"im-error\" role=\"alert\">").append(Html.esc(shown)).append("</p>")
                    .append(s.error() == null && !s.analyses().isEmpty() ? ErrorMarker.html(s.analyses().get(0)) : "")
                    .append("</section>");
            return sb.toString();
        }
        Analysis first = s.analyses().get(0);
        sb.append("<div class=\"im-cardgrid\"><figure class=\"im-drawing\">").append(Depiction.svg(first))
                .append(first.sites().isEmpty() ? "" : "<figcaption class=\"im-legend\"><span class=\"im-acid\">■ acid "
                        + "site</span> <span class=\"im-base\">● base site</span> numbers are the rows of the site table"
                        + "</figcaption>").append("</figure><div class=\"im-numbers\">");
        for (Analysis a : s.analyses()) {
            sb.append(sites(a)).append(summary(a));
        }
        sb.append("</div></div>");
        sb.append("<div class=\"im-cardgrid\">");
        if (s.curve() != null) {
            sb.append("<figure class=\"im-plotfig\">").append(Plot.svg(s.curve(), first.sites(), s.conditions().ph(),
                    s.conditions().phHigh())).append("</figure>");
        }
        sb.append("<div>").append(species(s.analyses())).append("</div></div>");
        if (!s.phases().isEmpty()) {
            sb.append("<div class=\"im-workup\"><h4>Work-up</h4><ul>");
            for (Partition p : s.phases()) {
                sb.append("<li>").append(Html.esc(WorkupPhases.sentence(p))).append("</li>");
            }
            sb.append("</ul><p class=\"im-small\">Fraction in the organic layer from logD (octanol/water, used for the "
                    + "named solvent) and the phase ratio; partition estimates are for planning.</p></div>");
        }
        // one caution line per card: the solver's own planning caution is the card's last line already
        List<String> warnings = first.warnings().stream().filter(w -> !w.contains("for planning")).toList();
        if (!warnings.isEmpty()) {
            sb.append("<ul class=\"im-warn\">");
            for (String w : warnings) {
                sb.append("<li>").append(Html.esc(w)).append("</li>");
            }
            sb.append("</ul>");
        }
        sb.append("<p class=\"im-caution\">").append(Html.esc(CAUTION)).append(" Table ")
                .append(Html.esc(first.tableVersion())).append(".</p></section>");
        return sb.toString();
    }

    private String sourceName() {
        return switch (s.source()) {
            case "molfile" -> "molfile";
            case "reaction" -> "reaction component";
            case "name" -> "structure from the name";
            default -> "SMILES";
        };
    }

    private static String conditions(ConditionsUsed c) {
        StringBuilder sb = new StringBuilder("<p class=\"im-cond\">");
        if (c.ph() == null) {
            sb.append("No pH found that applies to this structure: site pKa values only.");
        } else {
            String value = c.phHigh() != null ? StatedConditions.format(c.ph()) + "–" + StatedConditions.format(c.phHigh())
                    : c.implied() ? String.format(Locale.ROOT, "≈ %.1f", c.ph()) : StatedConditions.format(c.ph());
            sb.append("<b>pH ").append(value).append("</b>");
            sb.append(c.implied() ? ", implied by " : ", from ").append("<q>").append(Html.esc(c.phWords())).append("</q>");
            if (c.implied()) {
                sb.append(" <span class=\"im-implied\">implied</span>");
            }
        }
        sb.append(" · ").append(StatedConditions.format(c.temperatureC())).append(" °C");
        if (c.temperatureWords() != null) {
            sb.append(" from <q>").append(Html.esc(c.temperatureWords())).append("</q>");
        }
        sb.append(" · I = ").append(StatedConditions.format(c.ionicStrengthM())).append(" M");
        if (c.ionicWords() != null) {
            sb.append(" from <q>").append(Html.esc(c.ionicWords())).append("</q>");
        }
        sb.append("</p>");
        if (!c.notes().isEmpty()) {
            sb.append("<ul class=\"im-notes\">");
            for (String n : c.notes()) {
                sb.append("<li>").append(Html.esc(n)).append("</li>");
            }
            sb.append("</ul>");
        }
        return sb.toString();
    }

    private static String sites(Analysis a) {
        if (a.sites().isEmpty()) {
            return "<p class=\"im-nosites\">No ionizable site the table covers"
                    + (a.conditions().hasPh() ? " (at pH " + StatedConditions.format(a.conditions().ph()) + ")" : "")
                    + ": neutral over the aqueous range.</p>";
        }
        StringBuilder sb = new StringBuilder("<table class=\"im-sites\"><caption>")
                .append(a.conditions().hasPh() ? "Sites at pH " + StatedConditions.format(a.conditions().ph())
                        : "Sites (no pH)")
                .append("</caption><thead><tr><th>#</th><th>atom</th><th>site</th><th>kind</th>"
                        + "<th title=\"microscopic: this site with every other site in its reference form\">site pKa "
                        + "(micro)</th><th>±</th><th>protonated</th><th>basis</th></tr></thead><tbody>");
        List<Site> sites = a.sites();
        for (int row = 0; row < sites.size(); row++) {
            Site s = sites.get(row);
            boolean acid = s.type() == SiteType.ACID;
            // data-label names each cell where a narrow page stacks the row (see the host's style sheet)
            sb.append("<tr><td data-label=\"#\">").append(row + 1).append("</td><td data-label=\"atom\">")
                    .append(Html.esc(s.element())).append(AtomNumbers.shown(s.atom()))
                    .append("</td><td data-label=\"site\"><details><summary>")
                    .append(Html.esc(s.groupName())).append("</summary><ol>");
            for (Term t : s.derivation()) {
                sb.append("<li>").append(signed(t.value())).append(' ').append(Html.esc(t.label()))
                        .append(" <cite>").append(Html.esc(t.source())).append("</cite></li>");
            }
            sb.append("</ol></details></td><td data-label=\"kind\" class=\"")
                    .append(acid ? "im-acid\">■ acid" : "im-base\">● base")
                    .append("</td><td data-label=\"site pKa (micro)\">").append(s.permanent() ? "fixed" : fmt(s.pka()))
                    .append("</td><td data-label=\"±\">").append(s.permanent() ? "" : fmt(s.sd()))
                    .append("</td><td data-label=\"protonated\">")
                    .append(s.protonated() == null ? "–" : pct(s.protonated()))
                    .append("</td><td data-label=\"basis\">").append(Html.esc(s.basis().label())).append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    private static String summary(Analysis a) {
        StringBuilder sb = new StringBuilder("<p class=\"im-summary\">macroscopic pKa ");
        sb.append(a.macroPka().isEmpty() ? "none in −2…16" : Html.esc(a.macroPka().stream()
                .map(v -> String.format(Locale.ROOT, "%.2f", v)).toList().toString()));
        if (a.netCharge() != null) {
            double zw = zwitterion(FullProfile.of(a).species());
            sb.append("; net charge ").append(signed(a.netCharge())).append("; uncharged ")
                    .append(pct(Math.max(0, a.fractionNeutral() - zw)));
            if (zw >= 0.0005) {
                sb.append("; zwitterion ").append(pct(zw));
            }
            if (FullProfile.of(a).logD() != null && !FullProfile.of(a).logD().isNaN()) {
                sb.append("; logD ").append(fmt(FullProfile.of(a).logD())).append(" (logP ").append(fmt(FullProfile.of(a).logP())).append(')');
            }
        }
        return sb.append("</p>").toString();
    }

    /** The leading species, drawn, with their share and charge. */
    private static String species(List<Analysis> analyses) {
        StringBuilder sb = new StringBuilder();
        for (Analysis a : analyses) {
            if (FullProfile.of(a).species().isEmpty()) {
                continue;
            }
            sb.append("<div class=\"im-species\"><h4>Species at pH ").append(StatedConditions.format(a.conditions().ph()))
                    .append("</h4>");
            int shown = 0;
            for (Species sp : FullProfile.of(a).species()) {
                if (sp.fraction() < 0.01 || shown == 4) {
                    continue;
                }
                shown++;
                sb.append("<figure>").append(Depiction.species(sp.smiles())).append("<figcaption>").append(pct(sp.fraction()))
                        .append(", charge ").append(sp.charge() > 0 ? "+" + sp.charge() : sp.charge() < 0 ? "−"
                                + (-sp.charge()) : "0").append(zwitterion(sp) ? " (zwitterion)" : "")
                        .append("</figcaption></figure>");
            }
            sb.append("</div>");
        }
        return sb.toString();
    }

    /** Share of species with net charge 0 that carry charges of both signs (nitro and N-oxide pairs aside). */
    static double zwitterion(List<Species> species) {
        return species.stream().filter(Card::zwitterion).mapToDouble(Species::fraction).sum();
    }

    static boolean zwitterion(Species s) {
        if (s.charge() != 0) {
            return false;
        }
        String smi = s.smiles().replaceAll("\\[[Nn]\\+\\]\\(=O\\)\\[O-\\]|\\[[Nn]\\+\\]\\(\\[O-\\]\\)|\\[O-\\]\\[[Nn]\\+\\]", "");
        return smi.contains("+") && smi.contains("-]");
    }

    static String fmt(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.equals("-0.00") ? "0.00" : s;
    }

    static String signed(double v) {
        String s = String.format(Locale.ROOT, "%+.2f", v);
        return s.equals("-0.00") || s.equals("+0.00") ? "0.00" : s;
    }

    static String pct(double f) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * f).replace("-0.0", "0.0");
    }

    private static String abbreviate(String w) {
        return w.length() <= 90 ? w : w.substring(0, 87) + "…";
    }
}
