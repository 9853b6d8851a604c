package ionmark.host.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.metatype.annotations.Designate;

import ionmark.host.api.AdminPage;
import ionmark.host.api.Block;
import ionmark.host.api.Decoration;
import ionmark.host.api.Entry;
import ionmark.host.api.EntryDecorator;
import ionmark.host.api.HostUser;
import ionmark.host.api.SidePanel;
import jakarta.servlet.Servlet;
import jakarta.servlet.http.HttpServlet;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

/**
 * The web shell: entry list, entry view with contributed decorations, an editor with a live
 * preview, and the contributed side panels. Every state-changing request carries the CSRF token.
 */
@Component(service = Servlet.class, configurationPid = "ionmark.host",
        property = {"osgi.http.whiteboard.servlet.pattern=/*", "osgi.http.whiteboard.servlet.name=ionmark-host"})
@Designate(ocd = HostConfiguration.class)
public final class WebShell extends HttpServlet {
    private static final long serialVersionUID = 1L;

    private final transient Workspace workspace;
    private final transient HostUser user;
    private final String csrf;
    private final transient List<EntryDecorator> decorators = new CopyOnWriteArrayList<>();
    private final transient List<SidePanel> panels = new CopyOnWriteArrayList<>();
    private final transient List<AdminPage> adminPages = new CopyOnWriteArrayList<>();

    @Activate
    public WebShell(HostConfiguration config, BundleContext ctx) throws IOException {
        String folder = config.workspace().isBlank() ? ctx.getProperty("ionmark.workspace") : config.workspace();
        this.workspace = new Workspace(Path.of(folder == null || folder.isBlank() ? "workspace" : folder));
        this.workspace.seedDemo();
        this.user = new HostUser(config.user(), Set.of(config.roles()));
        byte[] b = new byte[24];
        new SecureRandom().nextBytes(b);
        this.csrf = HexFormat.of().formatHex(b);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addDecorator(EntryDecorator d) {
        decorators.add(d);
    }

    void removeDecorator(EntryDecorator d) {
        decorators.remove(d);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addPanel(SidePanel p) {
        panels.add(p);
    }

    void removePanel(SidePanel p) {
        panels.remove(p);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addAdminPage(AdminPage p) {
        adminPages.add(p);
    }

    void removeAdminPage(AdminPage p) {
        adminPages.remove(p);
    }

    private boolean admin(String path, HttpServletRequest req, HttpServletResponse resp, boolean post)
            throws IOException {
        if (!path.startsWith("/admin/")) {
            return false;
        }
        String id = path.substring(7);
        AdminPage p = adminPages.stream().filter(x -> x.id().equals(id)).findFirst().orElse(null);
        if (p == null) {
            resp.sendError(404, "no such admin page");
        } else if (!user.has(p.requiredRole())) {
            resp.sendError(403, "the page needs the role " + p.requiredRole());
        } else {
            page(resp, p.title(), "<h1>" + Pages.esc(p.title()) + "</h1>" + p.handle(params(req), post, user, csrf));
        }
        return true;
    }

    @Override
    protected void doGet(HttpServletRequest req, HttpServletResponse resp) throws IOException {
        String path = req.getPathInfo() == null ? req.getRequestURI() : req.getPathInfo();
        try {
            if (admin(path, req, resp, false)) {
                return;
            }
            if (path.equals("/") || path.isEmpty()) {
                page(resp, "Entries", Pages.list(workspace.ids(), panels, adminPages.stream()
                        .filter(p -> user.has(p.requiredRole())).toList()));
            } else if (path.startsWith("/entry/") && path.endsWith("/edit")) {
                String id = path.substring(7, path.length() - 5);
                page(resp, "Edit " + id, Pages.editor(id, workspace.text(id), csrf));
            } else if (path.startsWith("/entry/")) {
                String id = path.substring(7);
                Entry e = workspace.entry(id);
                page(resp, e.title(), Pages.entry(e, decorations(e), panels));
            } else if (path.startsWith("/panel/")) {
                SidePanel p = panel(path.substring(7));
                if (p == null) {
                    resp.sendError(404, "no such panel");
                    return;
                }
                page(resp, p.title(), "<h1>" + Pages.esc(p.title()) + "</h1>" + p.html(params(req), user));
            } else {
                resp.sendError(404);
            }
        } catch (IllegalArgumentException | java.nio.file.NoSuchFileException e) {
            resp.sendError(404, "no such entry");
        }
    }

    @Override
    protected void doPost(HttpServletRequest req, HttpServletResponse resp) throws IOException {
        if (!csrf.equals(req.getHeader("X-Ionmark-Token")) && !csrf.equals(req.getParameter("token"))) {
            resp.sendError(403, "missing or wrong CSRF token");
            return;
        }
        String path = req.getPathInfo() == null ? req.getRequestURI() : req.getPathInfo();
        try {
            if (admin(path, req, resp, true)) {
                return;
            }
            if (path.equals("/preview")) {
                String text = new String(req.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
                Entry e = Workspace.parse("preview", text);
                send(resp, Pages.body(e, decorations(e)));
            } else if (path.startsWith("/entry/")) {
                String id = path.substring(7);
                workspace.save(id, req.getParameter("text") == null ? "" : req.getParameter("text"));
                resp.sendRedirect("/entry/" + id);
            } else {
                resp.sendError(404);
            }
        } catch (IllegalArgumentException e) {
            resp.sendError(400, e.getMessage());
        }
    }

    private Map<Integer, List<String>> decorations(Entry e) {
        Map<Integer, List<String>> out = new HashMap<>();
        for (EntryDecorator d : decorators) {
            for (Decoration x : d.decorate(e, user)) {
                out.computeIfAbsent(x.block(), k -> new java.util.ArrayList<>()).add(x.html());
            }
        }
        return out;
    }

    private SidePanel panel(String id) {
        return panels.stream().filter(p -> p.id().equals(id)).findFirst().orElse(null);
    }

    private static Map<String, String> params(HttpServletRequest req) {
        Map<String, String> m = new HashMap<>();
        req.getParameterMap().forEach((k, v) -> m.put(k, v.length > 0 ? v[0] : ""));
        return m;
    }

    private static void page(HttpServletResponse resp, String title, String body) throws IOException {
        send(resp, Pages.page(title, body));
    }

    private static void send(HttpServletResponse resp, String html) throws IOException {
        resp.setContentType("text/html; charset=UTF-8");
        resp.setHeader("Content-Security-Policy", "default-src 'self'; img-src 'self' data:; style-src 'self' "
                + "'unsafe-inline'; script-src 'self' 'unsafe-inline'");
        resp.setHeader("X-Content-Type-Options", "nosniff");
        resp.getOutputStream().write(html.getBytes(StandardCharsets.UTF_8));
    }

    /** Kept for the block-kind switch in {@link Pages}. */
    static boolean isStructure(Block b) {
        return b.kind() == Block.Kind.STRUCTURE;
    }
}
