package org.variset.web;

import io.javalin.Javalin;
import io.javalin.http.Context;
import io.javalin.http.staticfiles.Location;
import java.nio.file.Files;
import java.time.Clock;
import java.time.Duration;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.eclipse.jetty.server.Connector;
import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.HttpConnectionFactory;
import org.eclipse.jetty.server.SecureRequestCustomizer;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.ServerConnector;
import org.eclipse.jetty.server.SslConnectionFactory;
import org.eclipse.jetty.util.ssl.SslContextFactory;
import org.variset.app.Workspace;
import org.variset.app.account.Account;
import org.variset.app.account.Accounts;
import org.variset.archive.problem.ArchiveException;
import org.variset.web.page.Frame;
import org.variset.web.page.GymPages;
import org.variset.web.page.ImportPages;
import org.variset.web.page.ResetPages;
import org.variset.web.page.RoutePages;
import org.variset.web.page.SearchPages;
import org.variset.web.page.SignInPages;
import org.variset.web.page.Site;
import org.variset.web.security.Guard;
import org.variset.web.security.Need;
import org.variset.web.security.Refusal;
import org.variset.web.security.Sessions;
import org.variset.web.security.SignInLimiter;
import org.variset.web.security.SignInRedirect;

/**
 * The web workspace over one open workspace: started, it serves until closed. Every route names the {@link Need} it
 * has; the {@link Guard} checks it before the handler runs.
 */
public final class WebServer implements AutoCloseable {
    private static final Logger LOG = Logger.getLogger(WebServer.class.getName());

    /** Failed sign-ins allowed per account name, and per address, in {@link #SIGN_IN_WINDOW}. */
    static final int SIGN_IN_FAILURES = 5;

    static final Duration SIGN_IN_WINDOW = Duration.ofMinutes(15);

    private final Javalin app;
    private final Sessions sessions;
    private final ServeOptions options;

    private WebServer(Javalin app, Sessions sessions, ServeOptions options) {
        this.app = app;
        this.sessions = sessions;
        this.options = options;
    }

    /**
     * Starts serving a workspace.
     *
     * @param clock the clock of sessions and the sign-in limit (the workspace keeps its own for "today")
     * @throws IllegalArgumentException when the TLS keystore cannot be read
     */
    public static WebServer start(Workspace workspace, ServeOptions options, Clock clock) {
        if (options.tls() && !Files.isReadable(options.tlsKeystore())) {
            throw new IllegalArgumentException("Cannot read the TLS keystore " + options.tlsKeystore()
                    + ". Give a PKCS#12 file (.p12) with the server's key and certificate.");
        }
        Sessions sessions = new Sessions(clock, options.sessionIdle(), options.sessionLifetime());
        ArchiveGate gate = new ArchiveGate(workspace);
        Site site = new Site(
                gate,
                new Views(),
                sessions,
                new SignInLimiter(clock, SIGN_IN_FAILURES, SIGN_IN_WINDOW),
                options.tls(),
                clock);
        Guard guard = new Guard(sessions, name -> gate.use(w -> new Accounts(w).find(name)));
        Javalin app = Javalin.create(config -> {
            config.startup.showJavalinBanner = false;
            config.jetty.host = options.host();
            config.jetty.port = options.port();
            config.http.maxRequestSize = options.uploadLimitBytes();
            config.jetty.multipartConfig.maxFileSize(options.uploadLimitBytes(), io.javalin.config.SizeUnit.BYTES);
            config.jetty.multipartConfig.maxTotalRequestSize(
                    options.uploadLimitBytes() * 2, io.javalin.config.SizeUnit.BYTES);
            config.staticFiles.add(s -> {
                s.hostedPath = "/static";
                s.directory = "/static";
                s.location = Location.CLASSPATH;
                s.roles = Set.of(Need.NOBODY);
            });
            if (options.tls()) {
                config.jetty.modifyServer(server -> server.setConnectors(new Connector[] {tls(server, options)}));
            }
            config.routes.beforeMatched(guard::check);
            new SignInPages(site).register(config.routes);
            new GymPages(site).register(config.routes);
            new ResetPages(site).register(config.routes);
            new RoutePages(site).register(config.routes);
            new SearchPages(site).register(config.routes);
            new ImportPages(site, options.uploadLimitBytes()).register(config.routes);
            problems(config.routes, site);
        });
        app.start();
        return new WebServer(app, sessions, options);
    }

    /** What a person reads when a request cannot be served: a page with what to do, never a stack trace. */
    private static void problems(io.javalin.config.RoutesConfig r, Site site) {
        r.exception(
                SignInRedirect.class,
                (e, ctx) -> ctx.redirect("/signin?next="
                        + java.net.URLEncoder.encode(e.next(), java.nio.charset.StandardCharsets.UTF_8)
                        + (e.expired() ? "&expired" : "")));
        r.exception(Refusal.class, (e, ctx) -> problem(site, ctx, e.status(), e.title(), e.getMessage()));
        r.exception(
                IllegalArgumentException.class,
                (e, ctx) -> problem(site, ctx, 400, "Cannot show that", e.getMessage()));
        r.exception(
                ArchiveException.class,
                (e, ctx) -> problem(site, ctx, 503, "The archive cannot answer", e.getMessage()));
        r.exception(Exception.class, (e, ctx) -> {
            if (tooLarge(e)) {
                problem(
                        site,
                        ctx,
                        413,
                        "Upload too large",
                        "The upload is larger than the server takes. Split the "
                                + "files, or import them with 'variset import' on the server. Nothing was imported.");
                return;
            }
            LOG.log(Level.SEVERE, "request " + ctx.method() + " " + ctx.path() + " failed", e);
            problem(
                    site,
                    ctx,
                    500,
                    "Something went wrong",
                    "The server could not answer this request. Its log "
                            + "has the details; nothing was half-written (each change is one transaction).");
        });
        r.error(404, "*", ctx -> {
            if (ctx.result() == null || ctx.result().isEmpty() || ctx.result().startsWith("Endpoint")) {
                problem(site, ctx, 404, "Not found", "There is no page at " + ctx.path() + ".");
            }
        });
    }

    /** True when Jetty refused a request body for its size (it reports that as a bad multipart, deep inside). */
    static boolean tooLarge(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String m = t.getMessage();
            if (m != null
                    && (m.contains("max file size exceeded")
                            || m.contains("max length exceeded")
                            || m.contains("Request Entity Too Large")
                            || m.contains("413"))) {
                return true;
            }
        }
        return false;
    }

    private static Connector tls(Server server, ServeOptions options) {
        SslContextFactory.Server ssl = new SslContextFactory.Server();
        ssl.setKeyStorePath(options.tlsKeystore().toAbsolutePath().toString());
        ssl.setKeyStoreType("PKCS12");
        ssl.setKeyStorePassword(new String(options.tlsPassword()));
        HttpConfiguration https = new HttpConfiguration();
        https.addCustomizer(new SecureRequestCustomizer(false));
        ServerConnector c = new ServerConnector(
                server, new SslConnectionFactory(ssl, "http/1.1"), new HttpConnectionFactory(https));
        c.setHost(options.host());
        c.setPort(options.port());
        return c;
    }

    private static void problem(Site site, Context ctx, int status, String title, String message) {
        ctx.status(status);
        Map<String, Object> p = new HashMap<>();
        Account a = Guard.account(ctx);
        p.put("frame", a == null ? new Frame(title, null, null, "", false, false) : Frame.of(ctx, title));
        p.put("message", Optional.ofNullable(message).orElse(""));
        site.views().render(ctx, "problem.jte", p);
    }

    /** The port served (the one given, or the free one taken for 0). */
    public int port() {
        return app.port();
    }

    /** The address to open in a browser. */
    public String address() {
        String host = options.host().contains(":") ? "[" + options.host() + "]" : options.host();
        return (options.tls() ? "https://" : "http://") + host + ":" + port() + "/";
    }

    /** The sessions, for tests of their ending. */
    Sessions sessions() {
        return sessions;
    }

    /** Stops serving (the workspace stays open for whoever opened it). */
    @Override
    public void close() {
        app.stop();
    }
}
