package org.variset.app.account;

import com.password4j.Argon2Function;
import com.password4j.Password;
import com.password4j.types.Argon2;

/**
 * Password hashes: Argon2id (RFC 9106) through the password4j library, kept in PHC string form
 * ({@code $argon2id$v=19$m=...,t=...,p=...$salt$hash}) with a random 16-byte salt each.
 *
 * <p>The cost, 19 MiB of memory, 2 passes, 1 lane, is the lowest Argon2id setting the OWASP Password Storage Cheat
 * Sheet recommends (from memory; it is common practice for a server of this size). A hash records its own cost, so a
 * later, higher default still checks older hashes.
 */
public final class PasswordHashing {
    /** Memory in KiB. */
    static final int MEMORY_KIB = 19 * 1024;

    static final int ITERATIONS = 2;
    static final int PARALLELISM = 1;
    static final int HASH_BYTES = 32;
    static final int SALT_BYTES = 16;

    /** Passwords shorter than this are refused. */
    public static final int MIN_LENGTH = 12;

    private static final Argon2Function DEFAULT =
            Argon2Function.getInstance(MEMORY_KIB, ITERATIONS, PARALLELISM, HASH_BYTES, Argon2.ID);

    /** A hash of a password that matches nothing typed, checked when a name is unknown so that timing says nothing. */
    private static final String DECOY = hash("decoy password that is never anyone's".toCharArray());

    private PasswordHashing() {}

    /** The PHC string of a new hash of a password, with a new random salt. */
    public static String hash(char[] password) {
        return Password.hash(new String(password))
                .addRandomSalt(SALT_BYTES)
                .with(DEFAULT)
                .getResult();
    }

    /** True when the password matches the hash; false for a hash that is not Argon2id in PHC form. */
    public static boolean matches(char[] password, String phc) {
        if (phc == null || !phc.startsWith("$argon2id$")) {
            return false;
        }
        try {
            return Password.check(new String(password), phc).with(Argon2Function.getInstanceFromHash(phc));
        } catch (RuntimeException badHash) {
            return false;
        }
    }

    /** Spends the time one check takes, for a name that has no account. */
    static void checkDecoy(char[] password) {
        matches(password, DECOY);
    }

    /**
     * Why a new password is refused, or null when it is not.
     *
     * @param password the password
     * @param name the account's name, which the password may not be
     */
    public static String weakness(char[] password, String name) {
        String p = new String(password);
        if (p.codePointCount(0, p.length()) < MIN_LENGTH) {
            return "A password needs at least " + MIN_LENGTH + " characters.";
        }
        if (p.strip().equalsIgnoreCase(name)) {
            return "A password may not be the account's name.";
        }
        if (p.chars().distinct().count() < 4) {
            return "A password needs more than a few different characters.";
        }
        return null;
    }
}
