package org.variset.imports.fuzz;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Random;

/** Random damage to a file's bytes, one to four mutations per input, all from one seeded {@link Random}. */
final class Mutations {
    private static final String[] INSERTS = {
        "\"",
        ",",
        ";",
        "\t",
        "\n",
        "\r\n",
        "\uFEFF",
        "\u0000",
        "-1",
        "9999",
        "2026-02-30",
        "V99",
        "@@",
        "{",
        "}",
        "[",
        "]",
        ":",
        "null",
        "1e309",
        "NaN",
        "é",
        "\uD83E\uDDD7",
        "..",
        "../../etc/passwd",
        "=cmd()"
    };

    private Mutations() {}

    static byte[] mutate(byte[] in, Random r) {
        byte[] b = in.clone();
        int n = 1 + r.nextInt(4);
        for (int k = 0; k < n; k++) {
            b = once(b, r);
        }
        return b;
    }

    private static byte[] once(byte[] b, Random r) {
        if (b.length == 0) {
            return INSERTS[r.nextInt(INSERTS.length)].getBytes(StandardCharsets.UTF_8);
        }
        int at = r.nextInt(b.length);
        return switch (r.nextInt(8)) {
            case 0 -> flip(b, at, r);
            case 1 -> splice(b, at, INSERTS[r.nextInt(INSERTS.length)].getBytes(StandardCharsets.UTF_8));
            case 2 -> cut(b, at, 1 + r.nextInt(Math.min(64, b.length - at)));
            case 3 -> Arrays.copyOf(b, at);
            case 4 -> splice(b, at, longCell(r));
            case 5 -> duplicateLine(b, at);
            case 6 -> splice(b, at, randomBytes(r, 1 + r.nextInt(16)));
            default -> replaceAll(b, (byte) ',', (byte) (r.nextBoolean() ? ';' : '\t'));
        };
    }

    private static byte[] flip(byte[] b, int at, Random r) {
        b[at] ^= (byte) (1 << r.nextInt(8));
        return b;
    }

    private static byte[] splice(byte[] b, int at, byte[] insert) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(b.length + insert.length);
        out.write(b, 0, at);
        out.writeBytes(insert);
        out.write(b, at, b.length - at);
        return out.toByteArray();
    }

    private static byte[] cut(byte[] b, int at, int len) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(b.length);
        out.write(b, 0, at);
        out.write(b, at + len, b.length - at - len);
        return out.toByteArray();
    }

    private static byte[] longCell(Random r) {
        byte[] x = new byte[1 + r.nextInt(200_000)];
        Arrays.fill(x, (byte) ('a' + r.nextInt(26)));
        return x;
    }

    private static byte[] duplicateLine(byte[] b, int at) {
        int start = at;
        while (start > 0 && b[start - 1] != '\n') {
            start--;
        }
        int end = at;
        while (end < b.length && b[end] != '\n') {
            end++;
        }
        return splice(b, start, Arrays.copyOfRange(b, start, Math.min(b.length, end + 1)));
    }

    private static byte[] randomBytes(Random r, int n) {
        byte[] x = new byte[n];
        r.nextBytes(x);
        return x;
    }

    private static byte[] replaceAll(byte[] b, byte from, byte to) {
        for (int i = 0; i < b.length; i++) {
            if (b[i] == from) {
                b[i] = to;
            }
        }
        return b;
    }
}
