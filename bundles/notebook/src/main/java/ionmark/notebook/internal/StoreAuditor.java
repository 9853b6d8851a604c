package ionmark.notebook.internal;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.host.api.HostAuditor;
import ionmark.store.api.TableStore;

/** Sign-ins, failed sign-ins and denied requests seen by the host go into the table store's audit trail. */
@Component(service = HostAuditor.class)
public final class StoreAuditor implements HostAuditor {
    private final TableStore store;

    @Activate
    public StoreAuditor(@Reference TableStore store) {
        this.store = store;
    }

    @Override
    public void record(String user, String action, String outcome, String detail) {
        store.audit(user == null || user.isBlank() ? "unknown" : user, action, 0, outcome, detail);
    }
}
