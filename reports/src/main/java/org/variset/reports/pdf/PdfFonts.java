package org.variset.reports.pdf;

import com.lowagie.text.Font;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.FontMapper;
import com.lowagie.text.pdf.FontSelector;
import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * The fonts of a document: DejaVu Sans, bundled and embedded, for everything it covers; for characters it lacks (CJK
 * names, say), a font of the system that has them, looked for only when such a character appears. Characters no font
 * covers are collected so the caller can say so.
 */
final class PdfFonts {
    private static final List<String> SYSTEM_FONT_DIRS = List.of(
            "/usr/share/fonts",
            "/usr/local/share/fonts",
            System.getProperty("user.home") + "/.fonts",
            System.getProperty("user.home") + "/.local/share/fonts",
            "/Library/Fonts",
            "/System/Library/Fonts",
            "C:\\Windows\\Fonts");

    private final BaseFont regular;
    private final BaseFont bold;
    private final java.awt.Font awtRegular;
    private final java.awt.Font awtBold;
    private final List<BaseFont> fallbacks = new ArrayList<>();
    private final Set<String> missing = new TreeSet<>();
    private boolean searched;

    PdfFonts() {
        byte[] r = bytes("DejaVuSans.ttf");
        byte[] b = bytes("DejaVuSans-Bold.ttf");
        try {
            regular = BaseFont.createFont("DejaVuSans.ttf", BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false, r, null);
            bold = BaseFont.createFont("DejaVuSans-Bold.ttf", BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false, b, null);
            awtRegular = java.awt.Font.createFont(java.awt.Font.TRUETYPE_FONT, new java.io.ByteArrayInputStream(r));
            awtBold = java.awt.Font.createFont(java.awt.Font.TRUETYPE_FONT, new java.io.ByteArrayInputStream(b));
        } catch (IOException | java.awt.FontFormatException | RuntimeException e) {
            throw new IllegalStateException("the bundled fonts cannot be read", e);
        }
    }

    private static byte[] bytes(String name) {
        try (InputStream in = PdfFonts.class.getResourceAsStream("fonts/" + name)) {
            if (in == null) {
                throw new IllegalStateException("the bundled font " + name + " is missing from the jar");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Text in the document's font at a size, with fallbacks for characters DejaVu lacks. */
    Phrase phrase(String text, float size, boolean isBold, Color color) {
        String t = text == null ? "" : text;
        BaseFont main = isBold ? bold : regular;
        boolean covered = t.codePoints().allMatch(c -> c < 0x20 || main.charExists(c));
        if (covered) {
            return new Phrase(t, new Font(main, size, Font.NORMAL, color));
        }
        FontSelector s = new FontSelector();
        s.addFont(new Font(main, size, Font.NORMAL, color));
        for (BaseFont f : fallbacks(t)) {
            s.addFont(new Font(f, size, Font.NORMAL, color));
        }
        t.codePoints()
                .filter(c ->
                        c >= 0x20 && !main.charExists(c) && fallbacks.stream().noneMatch(f -> f.charExists(c)))
                .forEach(c -> missing.add(new String(Character.toChars(c))));
        Phrase p = s.process(t);
        // A processed phrase's own font is the library's default (Helvetica, not embedded), used for the line
        // ends it writes: give it the document's.
        p.setFont(new Font(main, size, Font.NORMAL, color));
        return p;
    }

    /** The document's font at a size, for paragraphs and cells that hold phrases (their line ends use it). */
    Font font(float size, boolean isBold, Color color) {
        return new Font(isBold ? bold : regular, size, Font.NORMAL, color);
    }

    /** The characters that no font could print, for a warning. */
    Set<String> missing() {
        return missing;
    }

    /** The font JFreeChart draws with (same glyphs as the document). */
    java.awt.Font awt(float size, boolean isBold) {
        return (isBold ? awtBold : awtRegular).deriveFont(size);
    }

    /** Maps the chart's AWT fonts to the embedded PDF fonts, so chart text is real, embedded text. */
    FontMapper mapper() {
        return new FontMapper() {
            @Override
            public BaseFont awtToPdf(java.awt.Font font) {
                return font.isBold() ? bold : regular;
            }

            @Override
            public java.awt.Font pdfToAwt(BaseFont font, int size) {
                return (font == bold ? awtBold : awtRegular).deriveFont((float) size);
            }
        };
    }

    private List<BaseFont> fallbacks(String text) {
        if (!searched) {
            searched = true;
            for (String dir : SYSTEM_FONT_DIRS) {
                Path d = Path.of(dir);
                if (!Files.isDirectory(d)) {
                    continue;
                }
                try (Stream<Path> s = Files.walk(d, 4)) {
                    s.filter(p -> p.toString()
                                    .toLowerCase(java.util.Locale.ROOT)
                                    .matches(".*\\.(ttf|otf|ttc)"))
                            .filter(p -> !p.getFileName().toString().startsWith("DejaVu"))
                            .limit(200)
                            .forEach(this::tryFont);
                } catch (IOException | UncheckedIOException e) {
                    // An unreadable font folder only means one fewer fallback.
                }
            }
        }
        return fallbacks;
    }

    private void tryFont(Path p) {
        String name =
                p.toString() + (p.toString().toLowerCase(java.util.Locale.ROOT).endsWith(".ttc") ? ",0" : "");
        try {
            fallbacks.add(BaseFont.createFont(name, BaseFont.IDENTITY_H, BaseFont.EMBEDDED));
        } catch (IOException | RuntimeException e) {
            // Not every file a font folder holds is a font OpenPDF can embed; skip it.
        }
    }
}
