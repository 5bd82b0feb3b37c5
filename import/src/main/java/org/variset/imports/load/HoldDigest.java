package org.variset.imports.load;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import org.variset.archive.route.HoldPlacement;

/**
 * A compact fingerprint of a route's whole hold list, ordered by seq then file order (docs/spec/interchange.md: a route's
 * holds are one unit). Keeps 16 bytes per hold instead of the holds themselves, so hold files can be compared
 * with the archive without holding them in memory.
 */
final class HoldDigest {
    private long[] order = new long[4];
    private long[] hashes = new long[4];
    private int size;
    private String firstFile = "";
    private int firstLine;

    /** Adds the next hold in file order, remembering where the first one was read (for messages). */
    void add(HoldPlacement.Spec spec, String file, int line) {
        if (size == 0) {
            firstFile = file;
            firstLine = line;
        }
        add(spec);
    }

    /** Adds the next hold in file order. */
    void add(HoldPlacement.Spec spec) {
        if (size == order.length) {
            order = Arrays.copyOf(order, size * 2);
            hashes = Arrays.copyOf(hashes, size * 2);
        }
        long seq = spec.seq() == null ? Integer.MAX_VALUE : spec.seq();
        order[size] = (seq << 32) | size;
        hashes[size] = hash(spec);
        size++;
    }

    /** The file of the first hold added, or empty. */
    String firstFile() {
        return firstFile;
    }

    /** The line of the first hold added, or 0. */
    int firstLine() {
        return firstLine;
    }

    /** How many holds were added. */
    int size() {
        return size;
    }

    /** The fingerprint of the list in its canonical order. */
    long value() {
        Integer[] idx = new Integer[size];
        for (int i = 0; i < size; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (a, b) -> Long.compare(order[a], order[b]));
        long h = 1125899906842597L;
        for (Integer i : idx) {
            h = 31 * h + hashes[i];
        }
        return 31 * h + size;
    }

    private static long hash(HoldPlacement.Spec s) {
        String text = s.seq() + "|" + s.role() + "|" + s.type() + "|" + s.size() + "|" + s.grips() + "|" + s.holdRef()
                + "|" + s.xM() + "|" + s.yM() + "|" + s.extraFields();
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            long v = 0;
            for (int i = 0; i < 8; i++) {
                v = (v << 8) | (d[i] & 0xff);
            }
            return v;
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this JVM", e);
        }
    }
}
