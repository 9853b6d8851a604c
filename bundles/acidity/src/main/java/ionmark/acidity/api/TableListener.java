package ionmark.acidity.api;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Whiteboard service: register one to hear about every new current table snapshot.
 * Called on a background thread after the new snapshot is visible to {@link TableService#current()}.
 */
@ConsumerType
@FunctionalInterface
public interface TableListener {
    void tableChanged(AcidityTable current);
}
