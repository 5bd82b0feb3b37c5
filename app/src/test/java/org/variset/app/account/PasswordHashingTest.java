package org.variset.app.account;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.Base64;
import org.bouncycastle.crypto.generators.Argon2BytesGenerator;
import org.bouncycastle.crypto.params.Argon2Parameters;
import org.junit.jupiter.api.Test;

class PasswordHashingTest {

    /**
     * The stored hash is Argon2id of the password under the salt and cost it records: recomputed here with an
     * independent implementation, Bouncy Castle's {@code Argon2BytesGenerator} (bcprov-jdk18on 1.87, Maven Central),
     * from the PHC string's own fields.
     */
    @Test
    void storesArgon2idThatAnIndependentImplementationRecomputes() {
        String phc = PasswordHashing.hash("chalk bucket on the ledge".toCharArray());
        // $argon2id$v=19$m=19456,t=2,p=1$<salt>$<hash>
        String[] f = phc.split("\\$");
        assertThat(f[1]).isEqualTo("argon2id");
        assertThat(f[2]).isEqualTo("v=19");
        assertThat(f[3]).isEqualTo("m=19456,t=2,p=1");
        byte[] salt = Base64.getDecoder().decode(f[4]);
        byte[] stored = Base64.getDecoder().decode(f[5]);
        assertThat(salt).hasSize(16);

        Argon2BytesGenerator bc = new Argon2BytesGenerator();
        bc.init(new Argon2Parameters.Builder(Argon2Parameters.ARGON2_id)
                .withVersion(Argon2Parameters.ARGON2_VERSION_13)
                .withMemoryAsKB(19456)
                .withIterations(2)
                .withParallelism(1)
                .withSalt(salt)
                .build());
        byte[] expected = new byte[32];
        bc.generateBytes("chalk bucket on the ledge".getBytes(StandardCharsets.UTF_8), expected);
        assertThat(stored).isEqualTo(expected);
    }

    @Test
    void checksTheRightPasswordAndRefusesAnyOther() {
        String phc = PasswordHashing.hash("chalk bucket on the ledge".toCharArray());
        assertThat(PasswordHashing.matches("chalk bucket on the ledge".toCharArray(), phc))
                .isTrue();
        assertThat(PasswordHashing.matches("chalk bucket on the ledgE".toCharArray(), phc))
                .isFalse();
        assertThat(PasswordHashing.matches("chalk bucket on the ledge".toCharArray(), "plain text"))
                .isFalse();
        assertThat(PasswordHashing.matches("x".toCharArray(), "$argon2id$garbage"))
                .isFalse();
    }

    @Test
    void saltsEveryHashAnew() {
        char[] p = "chalk bucket on the ledge".toCharArray();
        assertThat(PasswordHashing.hash(p)).isNotEqualTo(PasswordHashing.hash(p));
    }

    @Test
    void refusesShortOrSamePasswords() {
        assertThat(PasswordHashing.weakness("short".toCharArray(), "mara")).contains("at least 12");
        assertThat(PasswordHashing.weakness("mara.quill.01".toCharArray(), "mara.quill.01"))
                .contains("name");
        assertThat(PasswordHashing.weakness("aaaaaaaaaaaaaa".toCharArray(), "mara"))
                .contains("different characters");
        assertThat(PasswordHashing.weakness("crimp ladder seven".toCharArray(), "mara"))
                .isNull();
    }
}
