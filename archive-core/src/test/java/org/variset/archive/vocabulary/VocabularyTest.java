package org.variset.archive.vocabulary;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class VocabularyTest {
    private final Vocabulary v = Vocabulary.defaults();

    /** docs/spec/vocabulary.md: the spellings listed for each term. */
    @ParameterizedTest(name = "{0} {1} is {2}")
    @CsvSource({
        "HOLD_TYPES, Bucket, jug",
        "HOLD_TYPES, rail, edge",
        "HOLD_TYPES, foot  chip, foot-chip",
        "MOVES, heelhook, heel hook",
        "MOVES, Heel-Hook, heel hook",
        "MOVES, lunge, dyno",
        "MOVES, undercut, undercling",
        "STYLES, Slab, slab"
    })
    void mapsEverySpellingOfTheSpecToItsTerm(VocabularyField field, String spelling, String term) {
        assertThat(v.canonical(field, spelling)).contains(term);
    }

    @Test
    void keepsSpellingsInsideTheirField() {
        assertThat(v.canonical(VocabularyField.MOVES, "compression")).contains("compression");
        assertThat(v.canonical(VocabularyField.STYLES, "squeeze")).isEmpty();
    }

    /** docs/spec/vocabulary.md lists 10 hold types, 23 move descriptors and 12 style tags. */
    @Test
    void holdsTheDefaultTermsOfTheSpec() {
        assertThat(v.terms(VocabularyField.HOLD_TYPES)).hasSize(10).startsWith("jug", "crimp");
        assertThat(v.terms(VocabularyField.MOVES)).hasSize(23).contains("heel hook", "coordination");
        assertThat(v.terms(VocabularyField.STYLES)).hasSize(12);
    }

    @Test
    void takesAGymsOwnTermsInTheSameForm() {
        Vocabulary gym = v.extendedWith("[hold-types]\ndual-tex: dualtex\n[moves]\nheel hook: hooky heel\n");
        assertThat(gym.canonical(VocabularyField.HOLD_TYPES, "DualTex")).contains("dual-tex");
        assertThat(gym.canonical(VocabularyField.MOVES, "hooky heel")).contains("heel hook");
        assertThat(gym.terms(VocabularyField.HOLD_TYPES)).hasSize(11);
        assertThat(v.canonical(VocabularyField.HOLD_TYPES, "dualtex")).isEmpty();
    }

    @Test
    void namesTheLineOfABadSection() {
        assertThatThrownBy(() -> v.extendedWith("\n[grips]\nup")).hasMessageContaining("line 2");
    }
}
