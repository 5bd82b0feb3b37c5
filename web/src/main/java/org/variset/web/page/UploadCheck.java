package org.variset.web.page;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Locale;

/**
 * Checks an uploaded file by its content, not only its name: a workbook must be a ZIP container, a JSON document must
 * open with an object or array, a CSV file must be UTF-8 text. Names are reduced to a plain file name of their own.
 */
final class UploadCheck {
    private static final int SNIFF = 64 * 1024;

    private UploadCheck() {}

    /** The file name to keep: its last path segment, with anything but letters, digits, dot, dash and _ replaced. */
    static String safeName(String uploaded) {
        String n = uploaded == null ? "" : uploaded.replace('\\', '/');
        n = n.substring(n.lastIndexOf('/') + 1).strip();
        n = n.replaceAll("[^A-Za-z0-9._-]", "_");
        while (n.startsWith(".")) {
            n = n.substring(1);
        }
        return n.isEmpty() ? "upload" : n;
    }

    /** Why a file's content does not fit its name, or null when it does. */
    static String problem(String name, byte[] head) {
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".xlsx")) {
            boolean zip = head.length >= 4 && head[0] == 'P' && head[1] == 'K' && head[2] == 3 && head[3] == 4;
            return zip
                    ? null
                    : "is not an XLSX workbook (its content is not one). Save it from the spreadsheet as .xlsx.";
        }
        if (lower.endsWith(".json")) {
            String text = utf8(head);
            if (text == null) {
                return "is not UTF-8 text, so not a JSON document. Save it as UTF-8.";
            }
            String t = text.replace("\uFEFF", "").stripLeading();
            return t.startsWith("{") || t.startsWith("[")
                    ? null
                    : "does not start like a JSON document ({ or [). Export it again as JSON.";
        }
        if (lower.endsWith(".csv")) {
            if (contains(head, (byte) 0)) {
                return "holds binary data, not CSV text (is it a workbook renamed to .csv?). Save it as CSV UTF-8.";
            }
            return utf8(head) == null ? "is not UTF-8 text. Save it as \"CSV UTF-8\" from the spreadsheet." : null;
        }
        return "has an ending Variset does not read: give .csv, .xlsx or .json files (docs/spec/interchange.md).";
    }

    /** The first bytes of a file, as many as are needed to judge it. */
    static byte[] head(byte[] all) {
        return all.length <= SNIFF ? all : Arrays.copyOf(all, SNIFF);
    }

    private static boolean contains(byte[] b, byte v) {
        for (byte x : b) {
            if (x == v) {
                return true;
            }
        }
        return false;
    }

    /** The text of UTF-8 bytes, or null when they are not UTF-8 (a character cut at the end is allowed). */
    private static String utf8(byte[] b) {
        int end = b.length;
        // A multi-byte character may be cut at the sniffing limit: drop up to 3 trailing continuation bytes.
        if (b.length == SNIFF) {
            int back = 0;
            while (back < 3 && end > 0 && (b[end - 1] & 0xC0) == 0x80) {
                end--;
                back++;
            }
            if (end > 0 && (b[end - 1] & 0xC0) == 0xC0) {
                end--;
            }
        }
        try {
            return StandardCharsets.UTF_8
                    .newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(b, 0, end))
                    .toString();
        } catch (CharacterCodingException e) {
            return null;
        }
    }
}
