package ionmark.notebook.internal;

import java.util.List;
import java.util.Locale;

import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Site;
import ionmark.acidity.api.SiteType;

/**
 * Each site's protonated fraction against pH 0–14 as SVG, with axis titles, a legend naming every curve by
 * its row in the site table, and the stated pH (both ends of a stated range) marked.
 */
final class Plot {
    static final int W = 520;
    static final int H = 170;
    private static final int LEFT = 52;
    private static final int TOP = 10;
    private static final int PW = W - LEFT - 16;
    private static final String[] DASH = {"", "7 4", "2 3", "9 3 2 3", "1 2"};

    private Plot() {
    }

    static String svg(Curve c, List<Site> sites, Double low, Double high) {
        int legendRows = (sites.size() + 1) / 2;
        int total = TOP + H + 44 + 18 * legendRows;
        StringBuilder sb = new StringBuilder("<svg class=\"im-plot\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 "
                + W + " " + total + "\" width=\"" + W + "\" height=\"" + total + "\" role=\"img\" aria-label=\"fraction "
                + "protonated at each site against pH\" font-family=\"DejaVu Sans, sans-serif\">");
        if (low != null) {
            double x1 = x(low);
            double x2 = x(high == null ? low : high);
            if (x2 - x1 > 1) {
                sb.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%d\" width=\"%.1f\" height=\"%d\" "
                        + "fill=\"#e8edf5\"/>", x1, TOP, x2 - x1, H));
            }
            mark(sb, low);
            if (high != null && high > low) {
                mark(sb, high);
            }
        }
        sb.append("<rect x=\"" + LEFT + "\" y=\"" + TOP + "\" width=\"" + PW + "\" height=\"" + H
                + "\" fill=\"none\" stroke=\"#5b6475\"/>");
        for (int ph = 0; ph <= 14; ph += 2) {
            sb.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" x2=\"%.1f\" y1=\"%d\" y2=\"%d\" stroke=\"#5b6475\"/>"
                    + "<text x=\"%.1f\" y=\"%d\" font-size=\"11\" text-anchor=\"middle\">%d</text>", x(ph), x(ph), TOP + H,
                    TOP + H + 4, x(ph), TOP + H + 16, ph));
        }
        for (double f : new double[] {0, 0.5, 1}) {
            sb.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%.1f\" font-size=\"11\" text-anchor=\"end\">%s</text>",
                    LEFT - 4, y(f) + 4, f == 0.5 ? "0.5" : String.valueOf((int) f)));
        }
        sb.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" font-size=\"12\" text-anchor=\"middle\">pH</text>",
                LEFT + PW / 2.0, TOP + H + 32));
        sb.append(String.format(Locale.ROOT, "<text transform=\"translate(14 %.1f) rotate(-90)\" font-size=\"12\" "
                + "text-anchor=\"middle\">fraction protonated</text>", TOP + H / 2.0));
        for (int k = 0; k < sites.size(); k++) {
            Site s = sites.get(k);
            double[] f = c.siteProtonated().get(s.atom());
            if (f == null) {
                continue;
            }
            StringBuilder d = new StringBuilder();
            for (int i = 0; i < f.length; i++) {
                d.append(i == 0 ? "M" : "L").append(String.format(Locale.ROOT, "%.1f %.1f", x(c.ph()[i]), y(f[i])));
            }
            String dash = DASH[k % DASH.length];
            String stroke = s.type() == SiteType.ACID ? "#6a3d9a" : "#1b7837";
            sb.append("<path d=\"").append(d).append("\" fill=\"none\" stroke=\"").append(stroke)
                    .append("\" stroke-width=\"2\"").append(dash.isEmpty() ? "" : " stroke-dasharray=\"" + dash + "\"")
                    .append("><title>").append(legend(k, s)).append("</title></path>");
            int lx = LEFT + (k % 2) * (PW / 2);
            int ly = TOP + H + 48 + 18 * (k / 2);
            sb.append(String.format(Locale.ROOT, "<line x1=\"%d\" x2=\"%d\" y1=\"%d\" y2=\"%d\" stroke=\"%s\" "
                    + "stroke-width=\"2\"%s/><text x=\"%d\" y=\"%d\" font-size=\"11\">%s</text>", lx, lx + 28, ly - 4,
                    ly - 4, stroke, dash.isEmpty() ? "" : " stroke-dasharray=\"" + dash + "\"", lx + 34, ly,
                    Html.esc(legend(k, s))));
        }
        return sb.append("</svg>").toString();
    }

    static String legend(int row, Site s) {
        return (s.type() == SiteType.ACID ? "■" : "●") + (row + 1) + " " + s.element() + AtomNumbers.shown(s.atom()) + ", "
                + s.type().label() + (s.permanent() ? " (fixed)" : String.format(Locale.ROOT, ", site pKa %.2f", s.pka()));
    }

    private static void mark(StringBuilder sb, double ph) {
        double x = x(ph);
        sb.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" x2=\"%.1f\" y1=\"%d\" y2=\"%d\" stroke=\"#9b1c1c\" "
                + "stroke-width=\"2\"/><text x=\"%.1f\" y=\"%d\" font-size=\"11\" fill=\"#9b1c1c\">pH %s</text>", x, x,
                TOP, TOP + H, Math.min(x + 3, LEFT + PW - 40), TOP + 12, StatedConditions.format(ph)));
    }

    private static double x(double ph) {
        return LEFT + PW * Math.max(0, Math.min(14, ph)) / 14.0;
    }

    private static double y(double f) {
        return TOP + (1 - f) * H;
    }
}
