package org.variset.app.account;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;
import org.variset.app.Workspace;
import org.variset.archive.account.AccountRow;
import org.variset.archive.account.AccountStore;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;

/**
 * Making, changing, listing and signing in accounts. The first admin is made from the command line; there is never a
 * default password. Refusals are {@link IllegalArgumentException}s whose message says what to do.
 */
public final class Accounts {
    private static final Pattern NAME = Pattern.compile("[a-z0-9][a-z0-9._-]{1,63}");

    private final Workspace workspace;

    /** Accounts of a workspace's archive. */
    public Accounts(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Adds an account.
     *
     * @param gyms the gyms it is limited to (each must be in the archive), or empty for every gym
     * @throws IllegalArgumentException when the name is taken or malformed, a gym is unknown, or the password is weak
     */
    public Account add(String name, Role role, List<String> gyms, char[] password) {
        String n = normalName(name);
        List<String> g = knownGyms(gyms);
        refuseWeak(password, n);
        Instant now = workspace.clock().instant();
        AccountRow row = new AccountRow(n, role.code(), g, PasswordHashing.hash(password), now, now);
        if (!store().add(row)) {
            throw new IllegalArgumentException("There is already an account '" + n + "'. Choose another name, or "
                    + "change its password with 'variset user passwd " + n + "'.");
        }
        return toAccount(row);
    }

    /** Sets a new password. */
    public void setPassword(String name, char[] password) {
        String n = existing(name).name();
        refuseWeak(password, n);
        store().setPassword(n, PasswordHashing.hash(password), workspace.clock().instant());
    }

    /** Changes an account's role and the gyms it is limited to; the last admin keeps that role. */
    public Account setRole(String name, Role role, List<String> gyms) {
        Account a = existing(name);
        if (a.role() == Role.ADMIN && role != Role.ADMIN) {
            refuseLastAdmin(a.name(), "change its role");
        }
        List<String> g = knownGyms(gyms);
        store().setRole(a.name(), role.code(), g);
        return new Account(a.name(), role, g, a.createdAt(), a.passwordSetAt());
    }

    /** Removes an account; the last admin cannot be removed. */
    public void remove(String name) {
        Account a = existing(name);
        if (a.role() == Role.ADMIN) {
            refuseLastAdmin(a.name(), "remove it");
        }
        store().remove(a.name());
    }

    /** Every account, by name. */
    public List<Account> list() {
        return store().all().stream().map(Accounts::toAccount).toList();
    }

    /** The account of a name, if there is one. */
    public Optional<Account> find(String name) {
        return store().find(name.strip().toLowerCase(Locale.ROOT)).map(Accounts::toAccount);
    }

    /**
     * The account a name and password sign in, or empty. An unknown name costs the same time as a wrong password.
     */
    public Optional<Account> signIn(String name, char[] password) {
        Optional<AccountRow> row = store().find(name.strip().toLowerCase(Locale.ROOT));
        if (row.isEmpty()) {
            PasswordHashing.checkDecoy(password);
            return Optional.empty();
        }
        return PasswordHashing.matches(password, row.get().passwordHash())
                ? Optional.of(toAccount(row.get()))
                : Optional.empty();
    }

    private Account existing(String name) {
        return find(name)
                .orElseThrow(() -> new IllegalArgumentException(
                        "There is no account '" + name + "'. 'variset user list' shows the accounts there are."));
    }

    private void refuseLastAdmin(String name, String what) {
        if (store().countWithRole(Role.ADMIN.code()) <= 1) {
            throw new IllegalArgumentException(
                    "'" + name + "' is the only admin; make another admin first, then " + what + ".");
        }
    }

    private static void refuseWeak(char[] password, String name) {
        String weak = PasswordHashing.weakness(password, name);
        if (weak != null) {
            throw new IllegalArgumentException(weak + " Nothing was changed.");
        }
    }

    private static String normalName(String name) {
        String n = name.strip().toLowerCase(Locale.ROOT);
        if (!NAME.matcher(n).matches()) {
            throw new IllegalArgumentException("'" + name + "' cannot be an account name: use 2 to 64 letters, digits, "
                    + "dots, dashes or underscores, starting with a letter or digit (for example mara.quill).");
        }
        return n;
    }

    private List<String> knownGyms(List<String> gyms) {
        if (gyms.isEmpty()) {
            return List.of();
        }
        List<GymRecord> known = new ArchiveCatalog(workspace.archive().connection()).gyms();
        List<String> out = new ArrayList<>();
        for (String g : gyms) {
            GymRecord match = known.stream()
                    .filter(k -> k.name().equalsIgnoreCase(g.strip()))
                    .findFirst()
                    .orElseThrow(() -> new IllegalArgumentException("There is no gym '" + g + "' in the archive. "
                            + "The gyms are: "
                            + String.join(
                                    ", ", known.stream().map(GymRecord::name).toList())
                            + "."));
            out.add(match.name());
        }
        return out;
    }

    private AccountStore store() {
        return new AccountStore(workspace.archive().connection());
    }

    private static Account toAccount(AccountRow r) {
        return new Account(r.name(), Role.of(r.role()), r.gyms(), r.createdAt(), r.passwordSetAt());
    }
}
