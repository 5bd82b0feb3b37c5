package org.variset.imports.load;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.hibernate.Session;
import org.variset.archive.problem.Remedy;
import org.variset.imports.Problem;

/**
 * The gyms, walls and setters an import would create, and the new names that are probably an existing one written
 * another way ({@link NearNames}): each of those is a located problem, unless the import confirms the name
 * ({@link ImportOptions#newNames()}). Walls are compared within their gym; setters across the archive, as they are
 * shared by its gyms.
 */
final class NewNames {
    private final Session session;
    private final ImportPlan plan;

    NewNames(Session session, ImportPlan plan) {
        this.session = session;
        this.plan = plan;
    }

    /** Finds the new names, and records a problem for each near one. */
    void run() {
        Set<String> gyms = new HashSet<>(names("select g.name from Gym g"));
        Map<String, List<String>> walls = new LinkedHashMap<>();
        session.createSelectionQuery("select w.gym.name, w.name from Wall w", Object[].class)
                .getResultList()
                .forEach(r -> walls.computeIfAbsent((String) r[0], k -> new ArrayList<>())
                        .add((String) r[1]));
        List<String> setters = names("select s.name from Setter s");

        plan.gymsSeen.forEach((gym, where) -> {
            if (!gyms.contains(gym)) {
                check("gym", "gym", gym, List.copyOf(gyms), plan.newGymNames, where);
                plan.newGymNames.add(gym);
            }
        });
        Map<String, List<String>> newWalls = new LinkedHashMap<>();
        plan.wallsSeen.forEach((key, where) -> {
            List<String> archived = walls.getOrDefault(key.get(0), List.of());
            List<String> added = newWalls.computeIfAbsent(key.get(0), k -> new ArrayList<>());
            if (!archived.contains(key.get(1))) {
                check("wall", "wall", key.get(1), archived, added, where);
                added.add(key.get(1));
                plan.newWalls.add(key);
            }
        });
        Set<String> archivedSetters = new HashSet<>(setters);
        plan.settersSeen.forEach((name, where) -> {
            if (!archivedSetters.contains(name)) {
                check("setters", "setter", name, setters, plan.newSetterNames, where);
                plan.newSetterNames.add(name);
            }
        });
    }

    /** A problem when a new name is near one of the archive's, or one of the files' new names before it. */
    private void check(
            String column,
            String what,
            String name,
            List<String> archived,
            List<String> earlierNew,
            ImportPlan.Where where) {
        if (plan.options.newNames().contains(name)) {
            return;
        }
        String near = archived.stream()
                .filter(k -> NearNames.near(name, k))
                .findFirst()
                .orElse(null);
        boolean inArchive = near != null;
        if (near == null) {
            near = earlierNew.stream()
                    .filter(k -> NearNames.near(name, k))
                    .findFirst()
                    .orElse(null);
        }
        if (near == null) {
            return;
        }
        plan.problems.add(new Problem(
                where.file(),
                where.line(),
                column,
                what + " '" + name + "' would be new, but " + (inArchive ? "the archive has" : "the files also name")
                        + " '" + near + "' (" + NearNames.how(name, near) + ")",
                Remedy.of(Remedy.Kind.CONFIRM_NEW_NAME, "name", name, "known", near, "what", what)));
    }

    private List<String> names(String query) {
        return session.createSelectionQuery(query, String.class).getResultList();
    }
}
