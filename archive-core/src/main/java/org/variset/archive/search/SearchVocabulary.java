package org.variset.archive.search;

import java.sql.Connection;
import java.time.LocalDate;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.settings.SettingKey;
import org.variset.archive.settings.SettingsReader;
import org.variset.archive.vocabulary.Vocabulary;

/** The vocabulary a query is read with: the named gym's, or the default with every gym's own terms added. */
public final class SearchVocabulary {
    private SearchVocabulary() {}

    /**
     * The vocabulary in effect on a day.
     *
     * @param gym the gym the search is limited to, or null for all
     */
    public static Vocabulary of(Connection c, String gym, LocalDate day) {
        ArchiveCatalog catalog = new ArchiveCatalog(c);
        SettingsReader settings = new SettingsReader(c);
        if (gym != null) {
            return settings.inEffectOn(catalog.gym(gym).id(), day).vocabulary();
        }
        Vocabulary v = Vocabulary.defaults();
        for (GymRecord g : catalog.gyms()) {
            var own = settings.inEffectOn(g.id(), day).given(SettingKey.VOCABULARY, "");
            if (own.isPresent()) {
                v = v.extendedWith(own.get().value().asText());
            }
        }
        return v;
    }
}
