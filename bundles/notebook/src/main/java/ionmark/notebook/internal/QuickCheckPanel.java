package ionmark.notebook.internal;

import java.util.Map;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.host.api.HostUser;
import ionmark.host.api.SidePanel;
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
        return QuickCheckForm.html(annotator, params);
    }
}
