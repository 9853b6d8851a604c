package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Site;
import ionmark.acidity.api.SiteType;

/**
 * Each site's protonated fraction against pH 0–14 as SVG, with axis titles, a legend naming every curve by
 * its row in the site table, and the stated pH (both ends of a stated range) marked. The numbers are worked out
 * here; {@code plot.jte} writes the SVG.
 */
final class Plot {
    static final int W = 520;
    static final int H = 170;
    static final int LEFT = 52;
    static final int TOP = 10;
    static final int PW = W - LEFT - 16;
    private static final String[] DASH = {"", "7 4", "2 3", "9 3 2 3", "1 2"};

    /** What {@code plot.jte} draws, every coordinate already formatted. */
    record View(int total, String bandX, String bandWidth, List<Mark> marks, List<Tick> ticks, List<Tick> fractions,
            String phTitleX, String fractionTitleY, List<Line> lines) {
    }

    /** A stated pH: the red line and its label. */
    record Mark(String x, String labelX, String label) {
    }

    /** An axis tick: where and its text. */
    record Tick(String at, String text) {
    }

    /** One site's curve and its legend entry; {@code dash} is null for a solid line. */
    record Line(String d, String stroke, String dash, String legend, int legendX, int legendY) {
    }

    private Plot() {
    }

    static String svg(Curve c, List<Site> sites, Double low, Double high) {
        return Html.TEMPLATES.render("plot", "plot", view(c, sites, low, high)).strip();
    }

    static View view(Curve c, List<Site> sites, Double low, Double high) {
        int legendRows = (sites.size() + 1) / 2;
        int total = TOP + H + 44 + 18 * legendRows;
        String bandX = null;
        String bandWidth = null;
        List<Mark> marks = new ArrayList<>();
        if (low != null) {
            double x1 = x(low);
            double x2 = x(high == null ? low : high);
            if (x2 - x1 > 1) {
                bandX = f1(x1);
                bandWidth = f1(x2 - x1);
            }
            marks.add(mark(low));
            if (high != null && high > low) {
                marks.add(mark(high));
            }
        }
        List<Tick> ticks = new ArrayList<>();
        for (int ph = 0; ph <= 14; ph += 2) {
            ticks.add(new Tick(f1(x(ph)), String.valueOf(ph)));
        }
        List<Tick> fractions = new ArrayList<>();
        for (String f : new String[] {"0", "0.5", "1"}) {
            fractions.add(new Tick(f1(y(Double.parseDouble(f)) + 4), f));
        }
        List<Line> lines = new ArrayList<>();
        for (int k = 0; k < sites.size(); k++) {
            Site s = sites.get(k);
            if (!c.siteAtoms().contains(s.atom())) {
                continue;
            }
            StringBuilder d = new StringBuilder();
            for (int i = 0; i < c.size(); i++) {
                d.append(i == 0 ? "M" : "L").append(f1(x(c.phAt(i)))).append(' ').append(f1(y(c.protonatedAt(s.atom(), i))));
            }
            String dash = DASH[k % DASH.length];
            lines.add(new Line(d.toString(), s.type() == SiteType.ACID ? "#6a3d9a" : "#1b7837", dash.isEmpty() ? null : dash,
                    legend(k, s), LEFT + (k % 2) * (PW / 2), TOP + H + 48 + 18 * (k / 2)));
        }
        return new View(total, bandX, bandWidth, marks, ticks, fractions, f1(LEFT + PW / 2.0), f1(TOP + H / 2.0), lines);
    }

    static String legend(int row, Site s) {
        return (s.type() == SiteType.ACID ? "■" : "●") + (row + 1) + " " + s.element() + AtomNumbers.shown(s.atom()) + ", "
                + s.type().label() + (s.permanent() ? " (fixed)" : String.format(Locale.ROOT, ", site pKa %.2f", s.pka()));
    }

    private static Mark mark(double ph) {
        double x = x(ph);
        return new Mark(f1(x), f1(Math.min(x + 3, LEFT + PW - 40)), "pH " + StatedConditions.format(ph));
    }

    private static String f1(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    private static double x(double ph) {
        return LEFT + PW * Math.max(0, Math.min(14, ph)) / 14.0;
    }

    private static double y(double f) {
        return TOP + (1 - f) * H;
    }
}
