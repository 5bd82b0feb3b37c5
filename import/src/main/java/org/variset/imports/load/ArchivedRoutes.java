package org.variset.imports.load;

import java.sql.Connection;
import java.util.HashMap;
import java.util.Map;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.imports.row.RouteKey;

/**
 * The routes the archive already holds, with their holds, read one gym at a time with three queries (not two per
 * route): rows of one gym usually come together, so one gym is kept in memory at a time.
 */
final class ArchivedRoutes {
    private final ArchiveCatalog catalog;
    private final RouteReader reader;
    private String gym;
    private Map<RouteKey, RouteRecord> routes = Map.of();

    ArchivedRoutes(Connection connection) {
        this.catalog = new ArchiveCatalog(connection);
        this.reader = new RouteReader(connection);
    }

    /** The archived route with that key, or null. */
    RouteRecord get(RouteKey k) {
        if (!k.gym().equals(gym)) {
            gym = k.gym();
            routes = new HashMap<>();
            for (RouteRecord r : reader.read(RouteFilter.gym(catalog.gym(gym).id()))) {
                routes.put(new RouteKey(r.gym(), r.wall(), r.label(), r.setOn()), r);
            }
        }
        return routes.get(k);
    }
}
