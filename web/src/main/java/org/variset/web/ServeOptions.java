package org.variset.web;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;

/**
 * How the web workspace is served.
 *
 * @param host the address to listen on ({@code 127.0.0.1} unless opened to the network on purpose)
 * @param port the port (0: any free one)
 * @param tlsKeystore a PKCS#12 keystore with the server's key and certificate, or null to serve plain HTTP
 * @param tlsPassword the keystore's password (read from an environment variable or a file, never the command line)
 * @param sessionIdle how long a session lasts unused
 * @param sessionLifetime how long a session lasts at most
 * @param uploadLimitBytes the largest upload taken
 */
public record ServeOptions(
        String host,
        int port,
        Path tlsKeystore,
        char[] tlsPassword,
        Duration sessionIdle,
        Duration sessionLifetime,
        long uploadLimitBytes) {

    /** The address served when none is given: this machine only. */
    public static final String LOOPBACK = "127.0.0.1";

    /** The port served when none is given. */
    public static final int DEFAULT_PORT = 7070;

    /** Checks the fields. */
    public ServeOptions {
        Objects.requireNonNull(host, "host");
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("a port is a number from 1 to 65535 (it was " + port + ")");
        }
        if (tlsKeystore != null && tlsPassword == null) {
            throw new IllegalArgumentException("a TLS keystore needs its password");
        }
    }

    /** Loopback, plain HTTP, 30-minute idle sessions of at most 12 hours, uploads up to 20 MB. */
    public static ServeOptions loopback(int port) {
        return new ServeOptions(
                LOOPBACK, port, null, null, Duration.ofMinutes(30), Duration.ofHours(12), 20L * 1024 * 1024);
    }

    /** The same options on another address. */
    public ServeOptions listening(String newHost, int newPort) {
        return new ServeOptions(
                newHost, newPort, tlsKeystore, tlsPassword, sessionIdle, sessionLifetime, uploadLimitBytes);
    }

    /** The same options served over TLS. */
    public ServeOptions withTls(Path keystore, char[] password) {
        return new ServeOptions(host, port, keystore, password, sessionIdle, sessionLifetime, uploadLimitBytes);
    }

    /** The same options with other session times. */
    public ServeOptions withSessions(Duration idle, Duration lifetime) {
        return new ServeOptions(host, port, tlsKeystore, tlsPassword, idle, lifetime, uploadLimitBytes);
    }

    /** The same options with another upload limit. */
    public ServeOptions withUploadLimit(long bytes) {
        return new ServeOptions(host, port, tlsKeystore, tlsPassword, sessionIdle, sessionLifetime, bytes);
    }

    /** True when served over TLS. */
    public boolean tls() {
        return tlsKeystore != null;
    }

    /** True when the address is this machine only. */
    public boolean loopbackOnly() {
        return host.equals(LOOPBACK) || host.equals("::1") || host.equals("localhost");
    }
}
