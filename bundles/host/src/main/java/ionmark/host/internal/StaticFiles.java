package ionmark.host.internal;

import org.osgi.service.component.annotations.Component;

/**
 * The web shell's style sheet and script, served by the HTTP whiteboard from this bundle's
 * {@code ionmark/host/static} folder as {@code /static/host/*} (same origin, so the page policy needs no
 * 'unsafe-inline'). The whiteboard answers with the file's content type and its modification time.
 */
@Component(service = StaticFiles.class, property = {"osgi.http.whiteboard.resource.pattern=/static/host/*",
        "osgi.http.whiteboard.resource.prefix=/ionmark/host/static"})
public final class StaticFiles {
}
