package org.variset.archive.change;

import java.util.ArrayList;
import java.util.List;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.gym.Unknown;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.store.Transaction;

/** Renaming a setter, or merging two names of one person ("K. Ames" and "Kit Ames"), across the archive. */
public final class SetterChanges {
    private SetterChanges() {}

    /** As {@link #rename(Session, String, String)}, in a transaction. */
    public static void rename(Transaction tx, String from, String to) {
        rename(tx.session(), from, to);
    }

    /** As {@link #merge(Session, String, String)}, in a transaction. */
    public static int merge(Transaction tx, String from, String into) {
        return merge(tx.session(), from, into);
    }

    /**
     * Renames a setter everywhere.
     *
     * @throws IllegalArgumentException when the old name is unknown, or the new one is taken (merge instead)
     */
    public static void rename(Session s, String from, String to) {
        Setter old = find(s, from);
        if (findOrNull(s, to) != null) {
            throw new InputException(
                    InputException.Reason.EXISTS,
                    "a setter named '" + to.strip() + "' exists already",
                    Remedy.of(Remedy.Kind.MERGE_SETTERS, "from", from.strip(), "into", to.strip()));
        }
        old.rename(to);
        ChangeLog.setter(s, old.id());
    }

    /**
     * Gives every route of one setter to another and removes the first.
     *
     * @return how many routes changed
     * @throws IllegalArgumentException when a name is unknown or both are the same
     */
    public static int merge(Session s, String from, String into) {
        Setter gone = find(s, from);
        Setter kept = find(s, into);
        if (gone.id().equals(kept.id())) {
            throw new IllegalArgumentException("'" + from + "' and '" + into + "' are the same setter");
        }
        List<Route> routes = s.createSelectionQuery("select r from Route r join r.setters x where x = :s", Route.class)
                .setParameter("s", gone)
                .getResultList();
        ChangeLog.routes(s, routes.stream().map(Route::id).toList());
        for (Route r : routes) {
            List<Setter> next = new ArrayList<>();
            for (Setter x : r.setters()) {
                Setter y = x.id().equals(gone.id()) ? kept : x;
                if (!next.contains(y)) {
                    next.add(y);
                }
            }
            r.setSetters(next);
        }
        s.flush();
        s.remove(gone);
        return routes.size();
    }

    private static Setter find(Session s, String name) {
        Setter x = findOrNull(s, name);
        if (x == null) {
            throw Unknown.setter(
                    name,
                    s.createSelectionQuery("select name from Setter order by name", String.class)
                            .getResultList());
        }
        return x;
    }

    private static Setter findOrNull(Session s, String name) {
        return s.createSelectionQuery("from Setter where name = :n", Setter.class)
                .setParameter("n", name.strip())
                .uniqueResult();
    }
}
