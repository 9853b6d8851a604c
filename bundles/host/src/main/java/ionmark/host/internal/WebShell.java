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
import ionmark.host.api.HostAuditor;
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
    private final transient List<HostAuditor> auditors = new CopyOnWriteArrayList<>();
    private final transient RequestGuard guard = new RequestGuard();
    private final transient Users users;
    private final transient Sessions sessions = new Sessions();

    @Activate
    public WebShell(HostConfiguration config, BundleContext ctx) throws IOException {
        String folder = config.workspace().isBlank() ? ctx.getProperty("ionmark.workspace") : config.workspace();
        this.workspace = new Workspace(Path.of(folder == null || folder.isBlank() ? "workspace" : folder));
        this.workspace.seedDemo();
        this.user = new HostUser(config.user(), Set.of(config.roles()));
        byte[] b = new byte[24];
        new SecureRandom().nextBytes(b);
        this.csrf = HexFormat.of().formatHex(b);
        Path usersFile = config.usersFile().isBlank() ? workspace.folder().resolve(".ionmark").resolve("users.properties")
                : Path.of(config.usersFile());
        this.users = new Users(usersFile);
        if (users.isEmpty()) {
            // first start: one admin with a random password, written next to the users file for the operator
            String pw = users.randomPassword();
            users.put("admin", Set.of("viewer", "admin"), pw.toCharArray());
            Path pwFile = usersFile.resolveSibling("admin-password.txt");
            java.nio.file.Files.writeString(pwFile, pw + "\n");
            try {
                java.nio.file.Files.setPosixFilePermissions(pwFile,
                        java.nio.file.attribute.PosixFilePermissions.fromString("rw-------"));
            } catch (UnsupportedOperationException e) {
                // not a POSIX file system
            }
            System.err.println("ionmark: created user 'admin'; its password is in " + pwFile);
        }
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addAuditor(HostAuditor a) {
        auditors.add(a);
    }

    void removeAuditor(HostAuditor a) {
        auditors.remove(a);
    }

    private void audit(String who, String action, String outcome, String detail) {
        for (HostAuditor a : auditors) {
            try {
                a.record(who, action, outcome, detail);
            } catch (RuntimeException e) {
                System.err.println("ionmark: auditor failed: " + e.getMessage());
            }
        }
    }

    /** The request's user and CSRF token: the session's when signed in, else the local viewer's. */
    private record Who(HostUser user, String csrf, String session) {
    }

    private Who who(HttpServletRequest req) {
        String id = null;
        if (req.getCookies() != null) {
            for (var c : req.getCookies()) {
                if (c.getName().equals(Sessions.COOKIE)) {
                    id = c.getValue();
                }
            }
        }
        var s = sessions.get(id);
        return s.isPresent() ? new Who(s.get().user(), s.get().csrf(), id) : new Who(user, csrf, null);
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
        Who w = who(req);
        String id = path.substring(7);
        AdminPage p = adminPages.stream().filter(x -> x.id().equals(id)).findFirst().orElse(null);
        if (p == null) {
            fail(resp, w, 404, "There is no administration page '" + id + "'.");
        } else if (!w.user().has(p.requiredRole())) {
            audit(RequestGuard.actor(w.session() != null, w.user().name(), req), "request", "denied",
                    (post ? "POST " : "GET ") + path + " needs " + p.requiredRole());
            fail(resp, w, 403, "The page needs the role " + p.requiredRole() + (w.session() == null
                    ? ": sign in first." : "."));
        } else {
            page(resp, p.title(), w, Pages.contributed(p.title(), p.handle(params(req), post, w.user(), w.csrf())));
        }
        return true;
    }

    /** Every request runs under the limits and error rules of {@link RequestGuard}. */
    @Override
    protected void service(HttpServletRequest req, HttpServletResponse resp) throws IOException {
        guard.run(req, resp, (r, s) -> super.service(r, s));
    }

    @Override
    protected void doGet(HttpServletRequest req, HttpServletResponse resp) throws IOException {
        String path = req.getPathInfo() == null ? req.getRequestURI() : req.getPathInfo();
        try {
            if (admin(path, req, resp, false)) {
                return;
            }
            Who w = who(req);
            if (path.equals("/signin")) {
                page(resp, "Sign in", w, Pages.signIn(csrf, ""));
            } else if (path.equals("/signout")) {
                sessions.close(w.session());
                resp.setHeader("Set-Cookie", Sessions.cookie("", 0));
                resp.sendRedirect("/");
            } else if (path.equals("/") || path.isEmpty()) {
                String q = req.getParameter("q") == null ? "" : req.getParameter("q").strip();
                page(resp, "Entries", w, EntryPages.list(rows(q), q, mayEdit(w), List.copyOf(panels),
                        adminPages.stream().filter(p -> w.user().has(p.requiredRole())).toList()));
            } else if (path.equals("/new")) {
                if (mayEdit(w)) {
                    page(resp, "New entry", w, EntryPages.newEntry(w.csrf(), ""));
                } else {
                    fail(resp, w, 403, EditPolicy.refusal(w.session() != null));
                }
            } else if (path.startsWith("/entry/") && path.endsWith("/edit")) {
                String id = path.substring(7, path.length() - 5);
                if (mayEdit(w)) {
                    page(resp, "Edit " + id, w, EntryPages.editor(id, workspace.text(id), w.csrf()));
                } else {
                    fail(resp, w, 403, EditPolicy.refusal(w.session() != null));
                }
            } else if (path.startsWith("/entry/") && path.contains("/history")) {
                history(path.substring(7), resp, w);
            } else if (path.startsWith("/entry/")) {
                String id = path.substring(7);
                Entry e = workspace.entry(id);
                page(resp, e.title(), w, EntryPages.notices(e, !decorators.isEmpty()) + Pages.entry(e,
                        decorations(e, w.user()), panels));
            } else if (path.startsWith("/panel/")) {
                SidePanel p = panel(path.substring(7));
                if (p == null) {
                    fail(resp, w, 404, "There is no panel '" + path.substring(7) + "'.");
                    return;
                }
                page(resp, p.title(), w, Pages.contributed(p.title(), p.html(params(req), w.user())));
            } else {
                fail(resp, w, 404, "There is no page at " + path + ".");
            }
        } catch (IllegalArgumentException | java.nio.file.NoSuchFileException e) {
            fail(resp, who(req), 404, "There is no such entry.");
        }
    }

    @Override
    protected void doPost(HttpServletRequest req, HttpServletResponse resp) throws IOException {
        String path = req.getPathInfo() == null ? req.getRequestURI() : req.getPathInfo();
        if (path.startsWith("/panel/")) {
            // side panels only read (the quick check): their forms post so that a pasted molfile is not limited by
            // the length of a URL, and they change nothing, so they need no token
            doGet(req, resp);
            return;
        }
        Who w = who(req);
        // sign-in forms carry the local token; everything else the token of the request's session
        String expected = path.equals("/signin") ? csrf : w.csrf();
        if (!expected.equals(req.getHeader("X-Ionmark-Token")) && !expected.equals(req.getParameter("token"))) {
            audit(RequestGuard.actor(w.session() != null, w.user().name(), req), "request", "denied",
                    "POST " + path + " without a valid CSRF token");
            fail(resp, w, 403, "The form was stale or came from elsewhere (missing or wrong CSRF token): reload "
                    + "the page and try again.");
            return;
        }
        if (path.equals("/signin")) {
            signIn(req, resp, w);
            return;
        }
        try {
            if (admin(path, req, resp, true)) {
                return;
            }
            if (path.equals("/preview")) {
                String text = new String(req.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
                Entry e = Workspace.parse("preview", text);
                send(resp, EntryPages.notices(e, !decorators.isEmpty()) + Pages.body(e, decorations(e, w.user())));
            } else if (!mayEdit(w)) {
                audit(w.user().name(), "request", "denied", "POST " + path + " without an editing role");
                fail(resp, w, 403, EditPolicy.refusal(w.session() != null));
            } else if (path.equals("/new")) {
                String title = req.getParameter("title") == null ? "" : req.getParameter("title").strip();
                if (title.isEmpty()) {
                    page(resp, "New entry", w, EntryPages.newEntry(w.csrf(), "Give the entry a title."));
                    return;
                }
                String id = EntryPages.idFor(title, workspace.ids());
                workspace.save(id, "# " + title + "\n\n", w.user().name());
                resp.sendRedirect("/entry/" + id + "/edit");
            } else if (path.startsWith("/entry/")) {
                String id = path.substring(7);
                workspace.save(id, req.getParameter("text") == null ? "" : req.getParameter("text"), w.user().name());
                resp.sendRedirect("/entry/" + id);
            } else {
                fail(resp, w, 404, "There is no page at " + path + ".");
            }
        } catch (IllegalArgumentException e) {
            fail(resp, w, 400, e.getMessage());
        }
    }

    private void signIn(HttpServletRequest req, HttpServletResponse resp, Who w) throws IOException {
        String name = req.getParameter("user") == null ? "" : req.getParameter("user").strip();
        String pw = req.getParameter("password") == null ? "" : req.getParameter("password");
        Users.Attempt a = users.signIn(name, pw.toCharArray(), req.getRemoteAddr());
        audit(Users.printable(name), "sign-in", a.outcome(), req.getRemoteAddr());
        if (a.user().isPresent()) {
            resp.setHeader("Set-Cookie", Sessions.cookie(sessions.open(a.user().get()), Sessions.LIFETIME_MS / 1000));
            resp.sendRedirect("/");
            return;
        }
        String msg = a.outcome().equals("locked") || a.retryAfterMs() > 0
                ? "Too many failed attempts: try again in " + (a.retryAfterMs() / 1000 + 1) + " s."
                : "Wrong user name or password.";
        resp.setStatus(401);
        page(resp, "Sign in", w, Pages.signIn(csrf, msg));
    }

    private Map<Integer, List<String>> decorations(Entry e, HostUser who) {
        Map<Integer, List<String>> out = new HashMap<>();
        for (EntryDecorator d : decorators) {
            List<Decoration> found;
            try {
                found = d.decorate(e, who);
            } catch (RuntimeException ex) {
                // one contributor's failure must not take the entry down with it
                found = List.of(new Decoration(0, Pages.annotationsFailed(String.valueOf(ex.getMessage()))));
            }
            for (Decoration x : found) {
                out.computeIfAbsent(x.block(), k -> new java.util.ArrayList<>()).add(x.html());
            }
        }
        return out;
    }

    private boolean mayEdit(Who w) {
        return EditPolicy.mayEdit(w.user(), w.session() != null);
    }

    /** The entry list: title, last save and its author, filtered by a search over titles and text. */
    private List<EntryPages.Row> rows(String query) throws IOException {
        List<EntryPages.Row> rows = new java.util.ArrayList<>();
        String q = query.toLowerCase(java.util.Locale.ROOT);
        for (String id : workspace.ids()) {
            String text = workspace.text(id);
            Entry e = Workspace.parse(id, text);
            if (!q.isEmpty() && !e.title().toLowerCase(java.util.Locale.ROOT).contains(q)
                    && !text.toLowerCase(java.util.Locale.ROOT).contains(q)) {
                continue;
            }
            var last = workspace.history().last(id);
            String when = last.map(s -> EntryPages.WHEN.format(s.time())).orElseGet(() -> workspace.modified(id));
            rows.add(new EntryPages.Row(id, e.title(), when, last.map(EntryHistory.Save::author).orElse("–")));
        }
        return rows;
    }

    private void history(String rest, HttpServletResponse resp, Who w) throws IOException {
        String[] parts = rest.split("/history/?", 2);
        String id = parts[0];
        workspace.text(id); // 404 for an unknown entry
        if (parts.length > 1 && !parts[1].isEmpty()) {
            int n = Integer.parseInt(parts[1]);
            page(resp, id + " save " + n, w, EntryPages.savedText(id, n, workspace.history().text(id, n)));
        } else {
            page(resp, "History of " + id, w, EntryPages.history(id, workspace.history().saves(id)));
        }
    }

    /** A styled error page with the status. */
    private static void fail(HttpServletResponse resp, Who w, int status, String message) throws IOException {
        resp.setStatus(status);
        page(resp, status + "", w, EntryPages.error(status, message, w.session() != null));
    }

    private SidePanel panel(String id) {
        return panels.stream().filter(p -> p.id().equals(id)).findFirst().orElse(null);
    }

    private static Map<String, String> params(HttpServletRequest req) {
        Map<String, String> m = new HashMap<>();
        req.getParameterMap().forEach((k, v) -> m.put(k, v.length > 0 ? v[0] : ""));
        return m;
    }

    private static void page(HttpServletResponse resp, String title, Who w, String body) throws IOException {
        send(resp, Pages.page(title, body, w.session() == null ? null : w.user().name()));
    }

    /**
     * The page policy: scripts and styles only from the notebook's own static files (no inline code, no inline
     * style attributes), no plug-ins, no base rewriting, forms only to the notebook, and no framing.
     */
    static final String PAGE_POLICY = "default-src 'self'; img-src 'self' data:; style-src 'self'; script-src 'self'; "
            + "object-src 'none'; base-uri 'none'; form-action 'self'; " + RequestGuard.FRAME_ANCESTORS;

    private static void send(HttpServletResponse resp, String html) throws IOException {
        resp.setContentType("text/html; charset=UTF-8");
        resp.setHeader("Content-Security-Policy", PAGE_POLICY);
        resp.setHeader("X-Frame-Options", "DENY");
        resp.setHeader("X-Content-Type-Options", "nosniff");
        resp.getOutputStream().write(html.getBytes(StandardCharsets.UTF_8));
    }

    /** Kept for the block-kind switch in {@link Pages}. */
    static boolean isStructure(Block b) {
        return b.kind() == Block.Kind.STRUCTURE;
    }
}
