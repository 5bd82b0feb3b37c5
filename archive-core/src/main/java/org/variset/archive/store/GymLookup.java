package org.variset.archive.store;

import java.util.List;
import org.hibernate.Session;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Unknown;
import org.variset.archive.gym.Wall;

/**
 * Finds the gym and wall a command names, with messages that list what there is. The gym may be left out when
 * the archive holds only one.
 */
public final class GymLookup {
    private final ArchiveQueries q;

    /** Lookups in a transaction. */
    public GymLookup(Transaction tx) {
        this(tx.session());
    }

    /** Lookups in a session. */
    public GymLookup(Session session) {
        this.q = new ArchiveQueries(session);
    }

    /**
     * The named gym, or the only one.
     *
     * @throws IllegalArgumentException naming the gyms there are
     */
    public Gym gym(String name) {
        List<Gym> gyms = q.gyms();
        if (name == null) {
            if (gyms.size() == 1) {
                return gyms.get(0);
            }
            throw Unknown.unnamedGym(names(gyms));
        }
        return q.gym(name).orElseThrow(() -> Unknown.gym(name, names(gyms)));
    }

    /**
     * The named wall of the gym.
     *
     * @throws IllegalArgumentException naming the gym's walls
     */
    public Wall wall(Gym gym, String name) {
        return q.wall(gym, name)
                .orElseThrow(() -> Unknown.wall(
                        gym.name(), name, q.walls(gym).stream().map(Wall::name).toList()));
    }

    private static List<String> names(List<Gym> gyms) {
        return gyms.stream().map(Gym::name).toList();
    }
}
