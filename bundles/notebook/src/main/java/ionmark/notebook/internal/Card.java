package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.ConditionsUsed;
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

    /** The card as HTML: {@code card.jte} with this card's values, escaped by the template engine. */
    String html() {
        return Html.TEMPLATES.render("card", "card", this).strip();
    }

    /** One row of the site table, its numbers formatted. */
    record SiteRow(int number, String atom, String groupName, List<Line> derivation, boolean acid, String pka, String sd,
            String protonated, String basis) {
    }

    /** One line of a site's derivation: the signed shift, what it is, its source. */
    record Line(String value, String label, String source) {
    }

    /** A drawn species (SVG from {@link Depiction}) and its caption. */
    record Drawn(String svg, String caption) {
    }

    String sourceName() {
        return switch (s.source()) {
            case "molfile" -> "molfile";
            case "reaction" -> "reaction component";
            case "name" -> "structure from the name";
            default -> "SMILES";
        };
    }

    String words() {
        return abbreviate(s.words());
    }

    boolean fromName() {
        return s.source().equals("name") && s.error() == null;
    }

    /** Why the structure was not annotated, as the card says it; null when it was. */
    String refusal() {
        if (s.ok()) {
            return null;
        }
        String error = s.error() != null ? s.error() : s.analyses().get(0).error();
        // a refusal for time or load already says "not annotated"
        return error != null && error.startsWith("not annotated") ? "N" + error.substring(1) : "Cannot annotate: " + error;
    }

    Analysis first() {
        return s.analyses().get(0);
    }

    /** An unreadable SMILES with the character the reader stopped at marked (HTML from a template), or "". */
    String errorMarker() {
        return s.ok() || s.error() != null || s.analyses().isEmpty() ? "" : ErrorMarker.html(s.analyses().get(0));
    }

    /** Whether the full analysis lists species (a brief one has no profile). */
    static boolean hasSpecies(Analysis a) {
        return !FullProfile.of(a).species().isEmpty();
    }

    /** The structure drawn with its sites marked (SVG made by CDK from the analysed structure). */
    String drawing() {
        return Depiction.svg(first());
    }

    /** The site protonation plot (SVG), or null without a curve. */
    String plot() {
        return s.curve() == null ? null : Plot.svg(s.curve(), first().sites(), s.conditions().ph(),
                s.conditions().phHigh());
    }

    /** The stated pH as the conditions line shows it (a range, "≈ x" when implied). */
    String phValue() {
        ConditionsUsed c = s.conditions();
        return c.phHigh() != null ? StatedConditions.format(c.ph()) + "–" + StatedConditions.format(c.phHigh())
                : c.implied() ? String.format(Locale.ROOT, "≈ %.1f", c.ph()) : StatedConditions.format(c.ph());
    }

    static String format(double v) {
        return StatedConditions.format(v);
    }

    static String noSites(Analysis a) {
        return "No ionizable site the table covers" + (a.conditions().hasPh() ? " (at pH "
                + StatedConditions.format(a.conditions().ph()) + ")" : "") + ": neutral over the aqueous range.";
    }

    static String sitesCaption(Analysis a) {
        return a.conditions().hasPh() ? "Sites at pH " + StatedConditions.format(a.conditions().ph()) : "Sites (no pH)";
    }

    static List<SiteRow> rows(Analysis a) {
        List<SiteRow> out = new ArrayList<>();
        List<Site> sites = a.sites();
        for (int row = 0; row < sites.size(); row++) {
            Site x = sites.get(row);
            List<Line> lines = new ArrayList<>();
            for (Term t : x.derivation()) {
                lines.add(new Line(signed(t.value()), t.label(), t.source()));
            }
            out.add(new SiteRow(row + 1, x.element() + AtomNumbers.shown(x.atom()), x.groupName(), lines,
                    x.type() == SiteType.ACID, x.permanent() ? "fixed" : fmt(x.pka()), x.permanent() ? "" : fmt(x.sd()),
                    x.protonated() == null ? "–" : pct(x.protonated()), x.basis().label()));
        }
        return out;
    }

    static String summary(Analysis a) {
        StringBuilder sb = new StringBuilder("macroscopic pKa ");
        sb.append(a.macroPka().isEmpty() ? "none in −2…16" : a.macroPka().stream()
                .map(v -> String.format(Locale.ROOT, "%.2f", v)).toList().toString());
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
        return sb.toString();
    }

    /** The leading species (at least 1 %, four at most), drawn, with their share and charge. */
    static List<Drawn> species(Analysis a) {
        List<Drawn> out = new ArrayList<>();
        for (Species sp : FullProfile.of(a).species()) {
            if (sp.fraction() < 0.01 || out.size() == 4) {
                continue;
            }
            out.add(new Drawn(Depiction.species(sp.smiles()), pct(sp.fraction()) + ", charge " + (sp.charge() > 0
                    ? "+" + sp.charge() : sp.charge() < 0 ? "−" + (-sp.charge()) : "0")
                    + (zwitterion(sp) ? " (zwitterion)" : "")));
        }
        return out;
    }

    /** The work-up answer, one sentence per analysed pH. */
    List<String> workup() {
        return s.phases().stream().map(WorkupPhases::sentence).toList();
    }

    /** One caution line per card: the solver's own planning caution is the card's last line already. */
    List<String> warnings() {
        return first().warnings().stream().filter(w -> !w.contains("for planning")).toList();
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

    static String abbreviate(String w) {
        return w.length() <= 90 ? w : w.substring(0, 87) + "…";
    }
}
