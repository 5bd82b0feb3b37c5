package org.variset.app.names;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.NameListings;

/** The names a shell completes after an option: gyms, walls, setters, reset labels, one list for every front end. */
public final class NameCandidates {
    /** What kind of name. */
    public enum Kind {
        GYMS,
        WALLS,
        SETTERS,
        RESETS;

        /** The kind from its word ({@code walls}), or null. */
        public static Kind of(String word) {
            for (Kind k : values()) {
                if (k.name().equalsIgnoreCase(word)) {
                    return k;
                }
            }
            return null;
        }

        /** The words, for help and errors. */
        public static String words() {
            List<String> out = new ArrayList<>();
            for (Kind k : values()) {
                out.add(k.name().toLowerCase(Locale.ROOT));
            }
            return String.join(", ", out);
        }
    }

    private final Workspace workspace;

    /** Names from a workspace's archive. */
    public NameCandidates(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * The names of a kind, in the order the listings give them.
     *
     * @param gym the gym, or null when the archive holds one (every gym's, for {@link Kind#GYMS})
     */
    public List<String> names(Kind kind, String gym) {
        return switch (kind) {
            case GYMS ->
                new ArchiveCatalog(workspace.archive().connection())
                        .gyms().stream().map(GymRecord::name).toList();
            case WALLS ->
                new ListWalls(workspace)
                        .list(gym, null).walls().stream()
                                .map(NameListings.WallLine::name)
                                .toList();
            case SETTERS ->
                new ListSetters(workspace)
                        .list(gym).setters().stream()
                                .map(NameListings.SetterLine::name)
                                .toList();
            case RESETS ->
                new ListResets(workspace)
                        .list(gym, null, null).resets().stream()
                                .map(NameListings.ResetLine::label)
                                .toList();
        };
    }
}
