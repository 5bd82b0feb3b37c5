package org.variset.cli.command;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.concurrent.CountDownLatch;
import org.variset.app.Workspace;
import org.variset.app.account.Accounts;
import org.variset.cli.ExitCode;
import org.variset.web.ServeOptions;
import org.variset.web.WebServer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code variset serve}: the web workspace over this archive, until stopped. */
@Command(
        name = "serve",
        mixinStandardHelpOptions = true,
        description = {
            "Serve the web workspace over this archive until stopped (Ctrl-C): the overview, walls, reset audits "
                    + "with charts and PDFs, routes, and search, behind accounts made with 'variset user add'.",
            "It listens on 127.0.0.1 (this machine only) unless --listen opens it to the network; then serve it over "
                    + "TLS (--tls-keystore), or passwords cross the network in the clear.",
            "While it serves an embedded archive, other commands on that archive say it is in use, and by what."
        },
        footer = {
            "",
            "Examples:",
            "  variset user add mara --role admin",
            "  variset serve",
            "  VARISET_TLS_PASSWORD=... variset serve --listen 0.0.0.0:8443 --tls-keystore gym.p12"
        })
final class ServeCommand extends VarisetSubcommand {
    @Option(
            names = "--listen",
            paramLabel = "ADDR:PORT",
            description = "The address and port to listen on (default 127.0.0.1:7070; port 0 takes a free one).")
    String listen;

    @Option(
            names = "--tls-keystore",
            paramLabel = "FILE",
            description = "A PKCS#12 keystore (.p12) with the server's key and certificate: serve HTTPS.")
    Path keystore;

    @Option(
            names = "--tls-password-file",
            paramLabel = "FILE",
            description = "Read the keystore's password from the first line of FILE (else from the environment "
                    + "variable VARISET_TLS_PASSWORD).")
    Path passwordFile;

    /** Where the password of the keystore is looked for when no file names it. */
    static final String PASSWORD_VARIABLE = "VARISET_TLS_PASSWORD";

    @Override
    ExitCode execute() {
        ServeOptions options = options();
        try (Workspace w = workspace()) {
            if (new Accounts(w).list().isEmpty()) {
                err().println("warning: the archive has no accounts yet, so nobody can sign in. Make the first admin "
                        + "with: variset user add NAME --role admin");
            }
            try (WebServer server = WebServer.start(w, options, Clock.systemUTC())) {
                w.describeUse("variset serve at " + server.address() + "; stop it to use the archive here");
                if (!options.loopbackOnly() && !options.tls()) {
                    err().println("warning: serving plain HTTP on " + options.host() + ", open to the network: "
                            + "passwords and pages cross it unencrypted. Give --tls-keystore to serve HTTPS.");
                }
                out().println("Serving " + w.describe() + " at " + server.address());
                out().println("Open it in a browser; stop with Ctrl-C.");
                out().flush();
                waitUntilStopped(server, w);
            }
        }
        return ExitCode.OK;
    }

    private ServeOptions options() {
        ServeOptions o = ServeOptions.loopback(ServeOptions.DEFAULT_PORT);
        if (listen != null) {
            int colon = listen.lastIndexOf(':');
            if (colon <= 0 || colon == listen.length() - 1) {
                throw new IllegalArgumentException(
                        "--listen takes ADDR:PORT (for example 0.0.0.0:7070); it was '" + listen + "'.");
            }
            String host = listen.substring(0, colon).replace("[", "").replace("]", "");
            int port;
            try {
                port = Integer.parseInt(listen.substring(colon + 1));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException(
                        "--listen: '" + listen.substring(colon + 1) + "' is not a port " + "number.");
            }
            o = o.listening(host, port);
        }
        if (keystore != null) {
            o = o.withTls(keystore, tlsPassword());
        }
        return o;
    }

    private char[] tlsPassword() {
        if (passwordFile != null) {
            try {
                String first = Files.readAllLines(passwordFile, StandardCharsets.UTF_8).stream()
                        .findFirst()
                        .orElse("");
                return first.toCharArray();
            } catch (IOException e) {
                throw new IllegalArgumentException(
                        "Cannot read the password file " + passwordFile + ": " + e.getMessage());
            }
        }
        String env = root().cli().env().get(PASSWORD_VARIABLE);
        if (env == null) {
            throw new IllegalArgumentException("The keystore's password is not given: set " + PASSWORD_VARIABLE
                    + " or pass --tls-password-file FILE (never the password itself on the command line).");
        }
        return env.toCharArray();
    }

    /** Serves until the process is stopped; the stop closes the server and then the archive, in that order. */
    private static void waitUntilStopped(WebServer server, Workspace w) {
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime()
                .addShutdownHook(new Thread(
                        () -> {
                            server.close();
                            w.close();
                            stopped.countDown();
                        },
                        "variset-serve-stop"));
        try {
            stopped.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
