package ionmark.notebook.internal;

import java.util.Locale;
import java.util.Map;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Curve;

/** A small SVG plot of each site's protonated fraction against pH 0–14, the stated pH marked. */
final class Plot {
    static final int W = 320;
    static final int H = 120;
    private static final String[] DASH = {"", "6 3", "2 3", "8 3 2 3", "1 2"};

    private Plot() {
    }

    static String svg(Curve c, Analysis a) {
        StringBuilder sb = new StringBuilder("<svg class=\"im-plot\" xmlns=\"http://www.w3.org/2000/svg\" width=\"" + W
                + "\" height=\"" + (H + 24) + "\" role=\"img\" aria-label=\"site protonation against pH\">");
        sb.append("<rect x=\"30\" y=\"4\" width=\"" + (W - 40) + "\" height=\"" + H
                + "\" fill=\"none\" stroke=\"#555\"/>");
        for (int ph = 0; ph <= 14; ph += 2) {
            double x = x(ph);
            sb.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" font-size=\"9\" text-anchor=\"middle\">%d"
                    + "</text>", x, H + 16, ph));
        }
        int k = 0;
        for (Map.Entry<Integer, double[]> e : c.siteProtonated().entrySet()) {
            StringBuilder d = new StringBuilder();
            double[] f = e.getValue();
            for (int i = 0; i < f.length; i++) {
                d.append(i == 0 ? "M" : "L").append(String.format(Locale.ROOT, "%.1f %.1f", x(c.ph()[i]),
                        4 + (1 - f[i]) * H));
            }
            sb.append("<path d=\"").append(d).append("\" fill=\"none\" stroke=\"#222\" stroke-width=\"1.5\"")
                    .append(DASH[k % DASH.length].isEmpty() ? "" : " stroke-dasharray=\"" + DASH[k % DASH.length] + "\"")
                    .append("><title>atom ").append(e.getKey()).append("</title></path>");
            k++;
        }
        if (a.conditions().hasPh()) {
            double x = x(a.conditions().ph());
            sb.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" x2=\"%.1f\" y1=\"4\" y2=\"%d\" stroke=\"#B00\" "
                    + "stroke-width=\"2\"/><text x=\"%.1f\" y=\"12\" font-size=\"9\">pH %s</text>", x, x, H + 4, x + 2,
                    StatedConditions.format(a.conditions().ph())));
        }
        sb.append("<text x=\"2\" y=\"12\" font-size=\"9\">1</text><text x=\"2\" y=\"" + (H + 4)
                + "\" font-size=\"9\">0</text></svg>");
        return sb.toString();
    }

    private static double x(double ph) {
        return 30 + (W - 40) * Math.max(0, Math.min(14, ph)) / 14.0;
    }
}
