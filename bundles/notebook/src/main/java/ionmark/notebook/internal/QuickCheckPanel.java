package ionmark.notebook.internal;

import java.util.List;
import java.util.Map;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.host.api.HostUser;
import ionmark.host.api.SidePanel;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/** Paste a SMILES or molfile, set pH (and optionally temperature and ionic strength), get the card. */
@Component(service = SidePanel.class)
public final class QuickCheckPanel implements SidePanel {
    private final Annotator annotator;

    @Activate
    public QuickCheckPanel(@Reference Speciation speciation) {
        this.annotator = new Annotator(speciation);
    }

    @Override
    public String id() {
        return "quick-check";
    }

    @Override
    public String title() {
        return "Quick check";
    }

    @Override
    public String html(Map<String, String> params, HostUser user) {
        String structure = params.getOrDefault("structure", "");
        String ph = params.getOrDefault("ph", "");
        String t = params.getOrDefault("temp", "");
        String is = params.getOrDefault("ionic", "");
        StringBuilder sb = new StringBuilder("<form class=\"im-quick\" method=\"get\">");
        sb.append("<label>Structure (SMILES or molfile)<textarea name=\"structure\" rows=\"3\">").append(Html.esc(structure))
                .append("</textarea></label><label>pH <input name=\"ph\" size=\"5\" value=\"").append(Html.esc(ph))
                .append("\"></label><label>°C <input name=\"temp\" size=\"4\" value=\"").append(Html.esc(t))
                .append("\"></label><label>I (M) <input name=\"ionic\" size=\"5\" value=\"").append(Html.esc(is))
                .append("\"></label><button type=\"submit\">Check</button></form>");
        if (structure.isBlank()) {
            return sb.toString();
        }
        try {
            Double p = ph.isBlank() ? null : Double.parseDouble(ph.strip());
            double temp = t.isBlank() ? Conditions.STANDARD_TEMPERATURE : Double.parseDouble(t.strip());
            double ionic = is.isBlank() ? 0 : Double.parseDouble(is.strip());
            new Conditions(p, temp, ionic); // validates, with a message a chemist understands
            List<String> taken = p == null ? List.of() : List.of("pH " + ph.strip() + " (quick check)");
            sb.append(annotator.check(structure, p == null ? List.of() : List.of(p), temp, ionic, taken).html());
        } catch (NumberFormatException e) {
            sb.append("<p class=\"im-error\" role=\"alert\">pH, temperature and ionic strength must be numbers</p>");
        } catch (IllegalArgumentException e) {
            sb.append("<p class=\"im-error\" role=\"alert\">").append(Html.esc(e.getMessage())).append("</p>");
        }
        return sb.toString();
    }
}
