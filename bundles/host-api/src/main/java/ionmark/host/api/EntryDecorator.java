package ionmark.host.api;

import java.util.List;

import org.osgi.annotation.versioning.ConsumerType;

/** Contribution point: annotates the blocks of an entry. Register as an OSGi service. */
@ConsumerType
public interface EntryDecorator {
    List<Decoration> decorate(Entry entry, HostUser user);
}
