package ionmark.console.internal;

import java.util.Locale;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.ErrorPosition;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Species;
import ionmark.speciation.api.Term;

/** The readable summary of {@code check --format text}. */
final class TextReport {
    private TextReport() {
    }

    /** The SMILES with a caret under the character the reader stopped at, when it says; else "". */
    static String caret(Analysis a) {
        ErrorPosition at = a.errorPosition();
        if (at == null || at.unit() != ErrorPosition.Unit.CHARACTER) {
            return "";
        }
        return "  " + ErrorPosition.smilesAsRead(a.input()) + "\n  " + at.caret() + "\n";
    }

    static String of(Analysis a) {
        StringBuilder sb = new StringBuilder();
        if (!a.ok()) {
            return "error: " + a.error() + "\n" + caret(a);
        }
        sb.append("structure  ").append(a.smiles()).append('\n');
        sb.append("conditions ").append(a.conditions().hasPh() ? "pH " + a.conditions().ph() : "no pH stated")
                .append(String.format(Locale.ROOT, ", %.1f °C, I = %.3f M%n", a.conditions().temperature(),
                        a.conditions().ionicStrength()));
        sb.append("table      ").append(a.tableVersion()).append('\n');
        sb.append(String.format(Locale.ROOT, "%-5s %-4s %-30s %-5s %7s %6s %12s%n", "atom", "el", "group", "type", "pKa",
                "±sd", "protonated"));
        for (Site s : a.sites()) {
            sb.append(String.format(Locale.ROOT, "%-5d %-4s %-30s %-5s %7s %6s %12s%n", s.atom() + 1, s.element(),
                    s.group(), s.type().label(), s.permanent() ? "fixed" : String.format(Locale.ROOT, "%.2f", s.pka()),
                    s.permanent() ? "" : String.format(Locale.ROOT, "%.2f", s.sd()),
                    s.protonated() == null ? "-" : String.format(Locale.ROOT, "%.1f %%", 100 * s.protonated())));
            for (Term t : s.derivation()) {
                sb.append(String.format(Locale.ROOT, "        %+7.2f  %s%n", t.value(), t.label()));
            }
        }
        sb.append("macro pKa  ").append(a.macroPka()).append('\n');
        if (a.netCharge() != null) {
            double neutral = 100 * a.fractionNeutral();
            double uncharged = 100 * (a.fractionUncharged() == null ? a.fractionNeutral() : a.fractionUncharged());
            // the zwitterion share is only worth a word where there is one
            String split = neutral - uncharged < 0.05 ? "" : String.format(Locale.ROOT,
                    " (uncharged %.1f %%, zwitterions %.1f %%)", uncharged, neutral - uncharged);
            sb.append(String.format(Locale.ROOT, "net charge %.2f; neutral %.1f %%%s%s%n", a.netCharge(), neutral,
                    split, !a.hasProfile() || a.profile().logD() == null ? ""
                            : String.format(Locale.ROOT, "; logD %.2f", a.profile().logD())));
            for (Species s : a.hasProfile() ? a.profile().species() : java.util.List.<Species>of()) {
                if (s.fraction() >= 0.01) {
                    sb.append(String.format(Locale.ROOT, "  %5.1f %%  %+d  %s%n", 100 * s.fraction(), s.charge(),
                            s.smiles()));
                }
            }
        }
        a.corrections().forEach(c -> sb.append("note: ").append(c).append('\n'));
        a.warnings().forEach(w -> sb.append("caution: ").append(w).append('\n'));
        return sb.toString();
    }
}
