package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.Console;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Arrays;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.account.Account;
import org.variset.app.account.Accounts;
import org.variset.app.account.Role;
import org.variset.cli.ExitCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The accounts of the web workspace: {@code variset user add|passwd|role|remove|list}. */
@Command(
        name = "user",
        mixinStandardHelpOptions = true,
        description = {
            "Make and change the accounts that sign in to the web workspace ('variset serve').",
            "Roles: viewer (read and search), setter (also import and amend), head_setter (also strip, remove and "
                    + "change settings), admin (also manage accounts). The first admin is made here; there is no "
                    + "default password. Passwords are asked for at the terminal (twice), or read from the first "
                    + "line of standard input with --password-stdin; never from the command line."
        },
        subcommands = {
            UserCommand.Add.class,
            UserCommand.Passwd.class,
            UserCommand.SetRole.class,
            UserCommand.Remove.class,
            UserCommand.ListAccounts.class
        })
final class UserCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** What the commands that set a password share. */
    abstract static class WithPassword extends VarisetSubcommand {
        @Option(
                names = "--password-stdin",
                description = "Read the password from the first line of standard input (for scripts).")
        boolean passwordStdin;

        char[] password(String name) {
            if (passwordStdin) {
                try {
                    String line = root().cli().in().readLine();
                    if (line == null || line.isEmpty()) {
                        throw new IllegalArgumentException(
                                "--password-stdin was given, but standard input holds no password line.");
                    }
                    return line.toCharArray();
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
            Console console = System.console();
            if (console == null) {
                throw new IllegalArgumentException("There is no terminal to ask for " + name + "'s password. Pipe it "
                        + "in with --password-stdin (printf '%s\\n' \"$PW\" | variset user ... --password-stdin).");
            }
            char[] first = console.readPassword("Password for %s: ", name);
            char[] again = console.readPassword("Again: ");
            if (first == null || again == null || !Arrays.equals(first, again)) {
                throw new IllegalArgumentException("The two passwords differ. Nothing was changed.");
            }
            return first;
        }
    }

    /** {@code variset user add NAME --role ROLE [--gym GYM]...}. */
    @Command(name = "add", mixinStandardHelpOptions = true, description = "Make an account.")
    static final class Add extends WithPassword {
        @Parameters(index = "0", paramLabel = "NAME", description = "2 to 64 letters, digits, dots, dashes, _.")
        String name;

        @Option(
                names = "--role",
                required = true,
                paramLabel = "ROLE",
                description = "viewer, setter, head_setter or admin.")
        String role;

        @Option(
                names = "--gym",
                paramLabel = "GYM",
                description = "Limit the account to this gym (repeat for several); every gym when left out.")
        List<String> gyms = List.of();

        @Override
        ExitCode execute() {
            Role r = Role.of(role);
            try (Workspace w = workspace()) {
                Account a = new Accounts(w).add(name, r, gyms, password(name));
                out().println("Made account '" + a.name() + "' ("
                        + a.role().label().toLowerCase(java.util.Locale.ROOT)
                        + (a.gyms().isEmpty() ? ", every gym" : ", " + String.join(", ", a.gyms())) + ").");
            }
            return ExitCode.OK;
        }
    }

    /** {@code variset user passwd NAME}. */
    @Command(name = "passwd", mixinStandardHelpOptions = true, description = "Set an account's password.")
    static final class Passwd extends WithPassword {
        @Parameters(index = "0", paramLabel = "NAME")
        String name;

        @Override
        ExitCode execute() {
            try (Workspace w = workspace()) {
                new Accounts(w).setPassword(name, password(name));
            }
            out().println("Set a new password for '" + name.strip().toLowerCase(java.util.Locale.ROOT) + "'.");
            return ExitCode.OK;
        }
    }

    /** {@code variset user role NAME --role ROLE [--gym GYM]...}. */
    @Command(name = "role", mixinStandardHelpOptions = true, description = "Change an account's role and gyms.")
    static final class SetRole extends VarisetSubcommand {
        @Parameters(index = "0", paramLabel = "NAME")
        String name;

        @Option(names = "--role", required = true, paramLabel = "ROLE")
        String role;

        @Option(names = "--gym", paramLabel = "GYM", description = "Limit to this gym (repeat); every gym if none.")
        List<String> gyms = List.of();

        @Override
        ExitCode execute() {
            try (Workspace w = workspace()) {
                Account a = new Accounts(w).setRole(name, Role.of(role), gyms);
                out().println("'" + a.name() + "' is now " + a.role().code()
                        + (a.gyms().isEmpty() ? " over every gym." : " over " + String.join(", ", a.gyms()) + "."));
            }
            return ExitCode.OK;
        }
    }

    /** {@code variset user remove NAME}. */
    @Command(name = "remove", mixinStandardHelpOptions = true, description = "Remove an account.")
    static final class Remove extends VarisetSubcommand {
        @Parameters(index = "0", paramLabel = "NAME")
        String name;

        @Override
        ExitCode execute() {
            try (Workspace w = workspace()) {
                new Accounts(w).remove(name);
            }
            out().println("Removed account '" + name.strip().toLowerCase(java.util.Locale.ROOT) + "'.");
            return ExitCode.OK;
        }
    }

    /** {@code variset user list [--json]}. */
    @Command(name = "list", mixinStandardHelpOptions = true, description = "List the accounts (never passwords).")
    static final class ListAccounts extends VarisetSubcommand {
        @Option(names = "--json", description = "Print JSON for scripts.")
        boolean json;

        @Override
        ExitCode execute() {
            List<Account> all;
            try (Workspace w = workspace()) {
                all = new Accounts(w).list();
            }
            if (json) {
                ObjectNode root = Json.object();
                ArrayNode arr = root.putArray("accounts");
                for (Account a : all) {
                    ObjectNode o = arr.addObject();
                    o.put("name", a.name());
                    o.put("role", a.role().code());
                    ArrayNode gymList = o.putArray("gyms");
                    a.gyms().forEach(gymList::add);
                    o.put("created_at", a.createdAt().toString());
                    o.put("password_set_at", a.passwordSetAt().toString());
                }
                out().println(Json.write(root));
                return ExitCode.OK;
            }
            if (all.isEmpty()) {
                out().println("No accounts yet. Make the first admin with: variset user add NAME --role admin");
                return ExitCode.OK;
            }
            for (Account a : all) {
                out().printf(
                                "%-24s %-12s %s%n",
                                a.name(),
                                a.role().code(),
                                a.gyms().isEmpty() ? "every gym" : String.join(", ", a.gyms()));
            }
            return ExitCode.OK;
        }
    }
}
