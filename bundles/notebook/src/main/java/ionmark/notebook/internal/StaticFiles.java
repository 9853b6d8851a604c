package ionmark.notebook.internal;

import org.osgi.service.component.annotations.Component;

/**
 * The notebook's scripts and style sheets (quick check, table admin, measured import), served by the HTTP
 * whiteboard from this bundle's {@code ionmark/notebook/static} folder as {@code /static/notebook/*}. Pages link
 * them with {@code <script src>} and {@code <link rel="stylesheet">}: the host's page policy allows no inline code.
 */
@Component(service = StaticFiles.class, property = {"osgi.http.whiteboard.resource.pattern=/static/notebook/*",
        "osgi.http.whiteboard.resource.prefix=/ionmark/notebook/static"})
public final class StaticFiles {
    static final String TABLE_ADMIN = "<link rel=\"stylesheet\" href=\"/static/notebook/table-admin.css\">";
    static final String TABLE_ADMIN_JS = "<script src=\"/static/notebook/table-admin.js\" defer></script>";
}
