package org.variset.cli.command;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/**
 * The one list of Variset's commands ({@code commands.txt} beside this package's resources), read here and by the
 * launcher {@code ./variset}: each command's name, class, and whether it is long work (the launcher keeps the
 * optimising compiler for those), and the root options that take a value.
 */
final class CommandCatalog {
    private static final String FILE = "/org/variset/cli/commands.txt";

    /**
     * One command.
     *
     * @param name its word on the command line
     * @param type its class
     * @param longWork true when it runs long enough for the optimising compiler to pay
     */
    record Entry(String name, Class<?> type, boolean longWork) {}

    private static final CommandCatalog INSTANCE = read();

    private final List<Entry> commands;
    private final Set<String> valueOptions;

    private CommandCatalog(List<Entry> commands, Set<String> valueOptions) {
        this.commands = List.copyOf(commands);
        this.valueOptions = Set.copyOf(valueOptions);
    }

    /** The catalogue of this build. */
    static CommandCatalog get() {
        return INSTANCE;
    }

    /** The commands, in the order the help lists them. */
    List<Entry> commands() {
        return commands;
    }

    /** The root options that take a value. */
    Set<String> valueOptions() {
        return valueOptions;
    }

    /** The first word of a command line that is neither an option nor the value of a root option that takes one. */
    String commandName(String[] args) {
        int i = 0;
        while (i < args.length) {
            String a = args[i];
            if (a.equals("--")) {
                return null;
            }
            if (!a.startsWith("-")) {
                return a;
            }
            i += valueOptions.contains(a) ? 2 : 1;
        }
        return null;
    }

    private static CommandCatalog read() {
        List<Entry> commands = new ArrayList<>();
        Set<String> options = new TreeSet<>();
        try (InputStream in = CommandCatalog.class.getResourceAsStream(FILE)) {
            if (in == null) {
                throw new IllegalStateException(FILE + " is missing from the classpath");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            int n = 0;
            for (String line; (line = r.readLine()) != null; ) {
                n++;
                String[] f = line.strip().split("\\s+");
                if (f[0].isEmpty() || f[0].startsWith("#")) {
                    continue;
                }
                if (f[0].equals("option") && f.length == 2) {
                    options.add(f[1]);
                } else if (f[0].equals("command") && f.length == 4 && f[3].matches("long|short")) {
                    commands.add(new Entry(f[1], Class.forName(f[2]), f[3].equals("long")));
                } else {
                    throw new IllegalStateException(FILE + " line " + n + " is not 'command NAME CLASS long|short' "
                            + "or 'option NAME': " + line);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (ClassNotFoundException e) {
            throw new IllegalStateException(FILE + " names a class that is not there: " + e.getMessage(), e);
        }
        return new CommandCatalog(commands, options);
    }
}
