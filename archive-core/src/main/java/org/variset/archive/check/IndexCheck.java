package org.variset.archive.check;

import java.sql.Connection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.search.SearchIndex;

/** The index's part of a check: sound, in step with the database, one document per route. */
final class IndexCheck {
    private IndexCheck() {}

    static void add(SearchIndex index, Connection c, long routes, long dbStamp, List<CheckReport.Item> items) {
        SearchIndex.Health h = index.health();
        if (!h.exists()) {
            items.add(new CheckReport.Item(
                    "index", "Lucene CheckIndex", false, "there is no index yet: the next search builds it", true));
            return;
        }
        items.add(new CheckReport.Item("index", "Lucene CheckIndex", h.clean(), h.detail()));
        if (!h.clean()) {
            return;
        }
        boolean behind;
        if (ChangeLog.isShared(c)) {
            // A shared archive's stamps are transaction ids (ChangeLog): the index is behind when changes made at or
            // after its stamp are visible (some may already be applied, when a transaction was running as it synced).
            int unseen = h.stamp() < 0
                    ? -1
                    : ChangeLog.changedSince(c, h.stamp(), dbStamp).size();
            behind = unseen > 0;
            items.add(new CheckReport.Item(
                    "index",
                    "change stamp",
                    unseen == 0,
                    "index at transaction "
                            + h.stamp() + ", oldest running " + dbStamp
                            + (unseen == 0
                                    ? ""
                                    : "; " + unseen + " routes changed since (behind: the next search catches up)"),
                    behind));
        } else {
            behind = h.stamp() < dbStamp;
            items.add(new CheckReport.Item(
                    "index",
                    "change stamp",
                    h.stamp() == dbStamp,
                    "index " + h.stamp()
                            + ", database " + dbStamp
                            + (h.stamp() == dbStamp
                                    ? ""
                                    : h.stamp() < dbStamp
                                            ? " (behind: the next search catches up)"
                                            : " (ahead of the database)"),
                    behind));
        }
        documents(h, c, routes, behind, dbStamp, items);
    }

    /** One document per route; a difference the change log explains (the index is behind) is a note. */
    private static void documents(
            SearchIndex.Health h,
            Connection c,
            long routes,
            boolean behind,
            long dbStamp,
            List<CheckReport.Item> items) {
        Set<Long> db = ArchiveCheck.routeIds(c);
        Set<Long> missing = new HashSet<>(db);
        missing.removeAll(h.ids());
        Set<Long> extra = new HashSet<>(h.ids());
        extra.removeAll(db);
        boolean same = missing.isEmpty() && extra.isEmpty();
        // Behind only: every route missing or gone is one the change log will bring up to date at the next search.
        Set<Long> pending =
                behind && h.stamp() >= 0 ? new HashSet<>(ChangeLog.changedSince(c, h.stamp(), dbStamp)) : Set.of();
        boolean explained = pending.containsAll(missing) && pending.containsAll(extra);
        items.add(new CheckReport.Item(
                "index",
                "one document per route",
                same,
                h.ids().size() + " documents, "
                        + routes + " routes"
                        + (same
                                ? ""
                                : "; " + missing.size() + " routes missing, " + extra.size()
                                        + " documents of routes that are gone"
                                        + (explained ? " (changes the index has not caught up with yet)" : "")),
                !same && explained));
    }
}
