package org.variset.archive.settings;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.vocabulary.Vocabulary;

/**
 * The vocabulary each gym had on each day: the default with the gym's own terms added, as its settings stood that
 * day (docs/spec/vocabulary.md). One file may hold several gyms and years, so a reader of rows asks per row; each
 * gym's settings are read once. A gym the archive does not hold yet has the default vocabulary.
 */
public final class GymVocabularies {
    /** Always the default vocabulary, whatever the gym and day (for readers that need only route keys). */
    public static final GymVocabularies DEFAULT = new GymVocabularies(null);

    private final Connection connection;
    private final Map<String, Optional<SettingsTimeline>> timelines = new HashMap<>();

    private GymVocabularies(Connection connection) {
        this.connection = connection;
    }

    /** The vocabularies of the gyms of the archive on a connection the caller keeps open. */
    public static GymVocabularies of(Connection connection) {
        return new GymVocabularies(connection);
    }

    /** The vocabulary of a gym (by name, as written) on a day; the default for an unknown gym or a missing day. */
    public synchronized Vocabulary on(String gym, LocalDate day) {
        if (connection == null || gym == null || day == null) {
            return Vocabulary.defaults();
        }
        return timelines
                .computeIfAbsent(gym.strip(), this::timeline)
                .map(t -> t.on(day).vocabulary())
                .orElse(Vocabulary.defaults());
    }

    private Optional<SettingsTimeline> timeline(String gym) {
        Optional<GymRecord> g = new ArchiveCatalog(connection)
                .gyms().stream().filter(x -> x.name().equals(gym)).findFirst();
        return g.map(x -> new SettingsTimeline(new SettingsReader(connection).history(x.id())));
    }
}
