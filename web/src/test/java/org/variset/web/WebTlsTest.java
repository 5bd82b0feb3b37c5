package org.variset.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.CookieManager;
import java.net.http.HttpClient;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.security.KeyStore;
import java.security.cert.X509Certificate;
import javax.net.ssl.SSLContext;
import javax.net.ssl.TrustManagerFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Served over TLS from a PKCS#12 keystore made here with the JDK's keytool; the session cookie is then Secure. */
class WebTlsTest {
    @TempDir
    Path dir;

    @Test
    void servesHttpsWithSecureCookies() throws Exception {
        Path ks = dir.resolve("server.p12");
        String keytool =
                Path.of(System.getProperty("java.home"), "bin", "keytool").toString();
        Process p = new ProcessBuilder(
                        keytool,
                        "-genkeypair",
                        "-alias",
                        "variset",
                        "-keyalg",
                        "EC",
                        "-groupname",
                        "secp256r1",
                        "-dname",
                        "CN=localhost",
                        "-ext",
                        "SAN=ip:127.0.0.1",
                        "-validity",
                        "2",
                        "-storetype",
                        "PKCS12",
                        "-keystore",
                        ks.toString(),
                        "-storepass",
                        "test-keystore-pw")
                .redirectErrorStream(true)
                .start();
        assertThat(p.waitFor())
                .as(new String(p.getInputStream().readAllBytes()))
                .isZero();

        ServeOptions tls = ServeOptions.loopback(0).withTls(ks, "test-keystore-pw".toCharArray());
        try (WebFixture fx = WebFixture.start(dir, tls)) {
            assertThat(fx.server.address()).startsWith("https://127.0.0.1:");
            KeyStore trust = KeyStore.getInstance("PKCS12");
            try (var in = java.nio.file.Files.newInputStream(ks)) {
                trust.load(in, "test-keystore-pw".toCharArray());
            }
            KeyStore only = KeyStore.getInstance(KeyStore.getDefaultType());
            only.load(null, null);
            only.setCertificateEntry("variset", (X509Certificate) trust.getCertificate("variset"));
            TrustManagerFactory tmf = TrustManagerFactory.getInstance(TrustManagerFactory.getDefaultAlgorithm());
            tmf.init(only);
            SSLContext ssl = SSLContext.getInstance("TLS");
            ssl.init(null, tmf.getTrustManagers(), null);
            Client c = new Client(
                    fx.base(), HttpClient.newBuilder().sslContext(ssl).cookieHandler(new CookieManager()));
            HttpResponse<String> in = c.signIn("vik", WebFixture.PASSWORD);
            assertThat(in.statusCode()).isEqualTo(302);
            assertThat(in.headers().allValues("Set-Cookie"))
                    .anySatisfy(
                            h -> assertThat(h).startsWith("variset_session=").contains("Secure", "HttpOnly"));
            assertThat(c.get("/").body()).contains("Quarry Loft");
        }
    }
}
