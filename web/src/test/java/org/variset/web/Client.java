package org.variset.web;

import java.net.CookieManager;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/** A browser-like HTTP client for tests: keeps cookies, never follows redirects, reads forms' CSRF tokens. */
final class Client {
    private static final Pattern CSRF = Pattern.compile("name=\"csrf\" value=\"([^\"]+)\"");

    private final String base;
    private final HttpClient http;
    /** The CSRF token of the last page that had one. */
    String csrf;

    Client(String base) {
        this(base, HttpClient.newBuilder().cookieHandler(new CookieManager()));
    }

    Client(String base, HttpClient.Builder builder) {
        this.base = base;
        this.http = builder.followRedirects(HttpClient.Redirect.NEVER).build();
    }

    HttpResponse<String> get(String path) throws Exception {
        HttpResponse<String> r = http.send(
                HttpRequest.newBuilder(URI.create(base + path)).GET().build(), HttpResponse.BodyHandlers.ofString());
        remember(r);
        return r;
    }

    HttpResponse<byte[]> getBytes(String path) throws Exception {
        return http.send(
                HttpRequest.newBuilder(URI.create(base + path)).GET().build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    HttpResponse<String> post(String path, Map<String, String> form) throws Exception {
        String body = form.entrySet().stream()
                .map(e -> URLEncoder.encode(e.getKey(), StandardCharsets.UTF_8) + "="
                        + URLEncoder.encode(e.getValue(), StandardCharsets.UTF_8))
                .collect(Collectors.joining("&"));
        HttpResponse<String> r = http.send(
                HttpRequest.newBuilder(URI.create(base + path))
                        .header("Content-Type", "application/x-www-form-urlencoded")
                        .POST(HttpRequest.BodyPublishers.ofString(body))
                        .build(),
                HttpResponse.BodyHandlers.ofString());
        remember(r);
        return r;
    }

    /** Posts a multipart form (fields, then files by name), with the token of the last page. */
    HttpResponse<String> postFiles(String path, Map<String, String> fields, Map<String, byte[]> files)
            throws Exception {
        String boundary = "----variset-test-" + System.nanoTime();
        java.io.ByteArrayOutputStream body = new java.io.ByteArrayOutputStream();
        Map<String, String> f = new LinkedHashMap<>(fields);
        f.put("csrf", csrf);
        for (Map.Entry<String, String> e : f.entrySet()) {
            body.write(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + e.getKey() + "\"\r\n\r\n"
                            + e.getValue() + "\r\n")
                    .getBytes(StandardCharsets.UTF_8));
        }
        for (Map.Entry<String, byte[]> e : files.entrySet()) {
            body.write(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"files\"; filename=\"" + e.getKey()
                            + "\"\r\nContent-Type: application/octet-stream\r\n\r\n")
                    .getBytes(StandardCharsets.UTF_8));
            body.write(e.getValue());
            body.write("\r\n".getBytes(StandardCharsets.UTF_8));
        }
        body.write(("--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        HttpResponse<String> r = http.send(
                HttpRequest.newBuilder(URI.create(base + path))
                        .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                        .POST(HttpRequest.BodyPublishers.ofByteArray(body.toByteArray()))
                        .build(),
                HttpResponse.BodyHandlers.ofString());
        remember(r);
        return r;
    }

    /** Posts a form with the token of the last page. */
    HttpResponse<String> postWithToken(String path, Map<String, String> form) throws Exception {
        Map<String, String> f = new LinkedHashMap<>(form);
        f.put("csrf", csrf);
        return post(path, f);
    }

    /** Opens the sign-in page and signs in; returns the sign-in's response. */
    HttpResponse<String> signIn(String name, String password) throws Exception {
        get("/signin");
        return postWithToken("/signin", Map.of("name", name, "password", password, "next", "/"));
    }

    private void remember(HttpResponse<String> r) {
        Matcher m = CSRF.matcher(r.body());
        if (m.find()) {
            csrf = m.group(1);
        }
    }
}
