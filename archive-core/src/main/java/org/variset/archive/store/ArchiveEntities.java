package org.variset.archive.store;

import java.util.List;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.GymSetting;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;

/** The mapped entity classes, listed once for every bootstrap (no classpath scanning at start-up). */
public final class ArchiveEntities {
    /** Every entity class of the archive. */
    public static final List<Class<?>> ALL = List.of(
            Gym.class, Wall.class, GymSetting.class, Setter.class, Reset.class, Route.class, HoldPlacement.class);

    private ArchiveEntities() {}
}
