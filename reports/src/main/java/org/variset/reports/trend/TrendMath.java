package org.variset.reports.trend;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.scoring.grip.CircularStatistics;

/** The pure parts of a trend: lifetimes and setter profiles. */
final class TrendMath {
    private TrendMath() {}

    /** Lifetimes of the routes stripped in [from, to], and the routes up on {@code to}. */
    static Trend.Lifetime lifetime(List<RouteRecord> routes, LocalDate from, LocalDate to) {
        List<Long> days = new ArrayList<>();
        for (RouteRecord r : routes) {
            LocalDate s = r.strippedOn();
            if (s != null && !s.isBefore(from) && !s.isAfter(to)) {
                days.add(ChronoUnit.DAYS.between(r.setOn(), s));
            }
        }
        int up = (int) routes.stream().filter(r -> r.standingOn(to)).count();
        return new Trend.Lifetime(days.size(), median(days), up);
    }

    /** The median (mean of the middle two for an even count), or null for none. */
    static Double median(List<Long> values) {
        if (values.isEmpty()) {
            return null;
        }
        List<Long> v = values.stream().sorted().toList();
        int n = v.size();
        return n % 2 == 1 ? v.get(n / 2).doubleValue() : (v.get(n / 2 - 1) + v.get(n / 2)) / 2.0;
    }

    /** Each setter's routes and profile, most routes first, then by name. */
    static List<Trend.SetterProfile> setters(List<RouteRecord> routes) {
        Map<String, List<RouteRecord>> by = new LinkedHashMap<>();
        for (RouteRecord r : routes) {
            r.setters()
                    .forEach(s -> by.computeIfAbsent(s, k -> new ArrayList<>()).add(r));
        }
        List<Trend.SetterProfile> out = new ArrayList<>();
        by.forEach((s, mine) -> out.add(new Trend.SetterProfile(
                s,
                mine.size(),
                routes.isEmpty() ? 0 : mine.size() / (double) routes.size(),
                grips(mine),
                holds(mine),
                moves(mine))));
        out.sort((a, b) -> a.routes() != b.routes()
                ? Integer.compare(b.routes(), a.routes())
                : a.setter().compareTo(b.setter()));
        return out;
    }

    private static Map<String, Double> grips(List<RouteRecord> routes) {
        long[] c = new long[8];
        long n = 0;
        for (RouteRecord r : routes) {
            for (HoldRecord h : r.holds()) {
                if (h.isHand()) {
                    for (double g : h.grips()) {
                        c[CircularStatistics.sector(g)]++;
                        n++;
                    }
                }
            }
        }
        Map<String, Double> out = new LinkedHashMap<>();
        for (int i = 0; i < 8; i++) {
            out.put(CircularStatistics.sectorWord(i), n == 0 ? 0 : c[i] / (double) n);
        }
        return out;
    }

    private static Map<String, Double> holds(List<RouteRecord> routes) {
        Map<String, Long> c = new LinkedHashMap<>();
        // Hand holds only: foot chips lead every setter's table otherwise, and say nothing of a setter's hands.
        routes.forEach(
                r -> r.holds().stream().filter(HoldRecord::isHand).forEach(h -> c.merge(h.type(), 1L, Long::sum)));
        return sortedShares(c, c.values().stream().mapToLong(Long::longValue).sum());
    }

    private static Map<String, Double> moves(List<RouteRecord> routes) {
        Map<String, Long> c = new LinkedHashMap<>();
        routes.forEach(r -> r.moves().stream().distinct().forEach(m -> c.merge(m, 1L, Long::sum)));
        return sortedShares(c, routes.size());
    }

    private static Map<String, Double> sortedShares(Map<String, Long> counts, long total) {
        Map<String, Double> out = new LinkedHashMap<>();
        counts.entrySet().stream()
                .sorted(Map.Entry.<String, Long>comparingByValue().reversed().thenComparing(Map.Entry.comparingByKey()))
                .forEach(e -> out.put(e.getKey(), total == 0 ? 0 : e.getValue() / (double) total));
        return out;
    }
}
