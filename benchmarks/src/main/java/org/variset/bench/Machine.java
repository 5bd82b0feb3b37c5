package org.variset.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/** A line describing the machine the figures were measured on. */
final class Machine {
    private Machine() {}

    static String describe() {
        String cpu = firstValue(Path.of("/proc/cpuinfo"), "model name");
        String mem = firstValue(Path.of("/proc/meminfo"), "MemTotal");
        String memory = mem == null
                ? "unknown memory"
                : String.format(
                        Locale.ROOT,
                        "%.1f GiB RAM",
                        Long.parseLong(mem.replace("kB", "").strip()) / 1024.0 / 1024.0);
        return Runtime.getRuntime().availableProcessors() + " cores" + (cpu == null ? "" : " (" + cpu + ")") + ", "
                + memory + ", " + System.getProperty("os.name") + " " + System.getProperty("os.version") + ", "
                + System.getProperty("java.vm.name") + " " + System.getProperty("java.version");
    }

    private static String firstValue(Path file, String key) {
        try {
            for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
                if (line.startsWith(key)) {
                    int colon = line.indexOf(':');
                    return colon < 0 ? null : line.substring(colon + 1).strip();
                }
            }
        } catch (IOException e) {
            return null;
        }
        return null;
    }
}
