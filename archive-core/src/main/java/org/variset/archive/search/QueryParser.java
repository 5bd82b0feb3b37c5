package org.variset.archive.search;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Reads the query language into a syntax tree by recursive descent:
 *
 * <pre>
 * query   = or
 * or      = and { "OR" and }
 * and     = unary { ["AND"] unary }
 * unary   = ("NOT" | "-") unary | primary
 * primary = "(" or ")" | field ":" (word | "quoted phrase") | word | "quoted phrase"
 * </pre>
 *
 * AND, OR and NOT are keywords only in capitals; a field is one of {@link #FIELDS}.
 */
final class QueryParser {
    /** The fields a query may name. */
    static final Set<String> FIELDS = Set.of(
            "gym",
            "wall",
            "route",
            "color",
            "setter",
            "discipline",
            "grade",
            "band",
            "set",
            "stripped",
            "standing",
            "angle",
            "hold",
            "grip",
            "size",
            "move",
            "style",
            "notes");

    private static final Set<String> ALIASES =
            Set.of("label", "colour", "facing", "moves", "holds", "styles", "setters");

    private final String q;
    private int i;

    private QueryParser(String q) {
        this.q = q;
    }

    /** The syntax tree of a query. */
    static QueryNode parse(String query) {
        QueryParser p = new QueryParser(query == null ? "" : query);
        p.skipSpace();
        if (p.i >= p.q.length()) {
            throw new QuerySyntaxException(
                    p.q,
                    1,
                    "the query is empty (expected a word, a phrase in quotes or a " + "field such as move:dyno)");
        }
        QueryNode n = p.or();
        p.skipSpace();
        if (p.i < p.q.length()) {
            throw p.error(p.q.charAt(p.i) == ')' ? "this ')' closes no '('" : "expected the end of the query");
        }
        return n;
    }

    private QueryNode or() {
        List<QueryNode> parts = new ArrayList<>();
        parts.add(and());
        while (keyword("OR")) {
            skipSpace();
            if (atEndOfGroup()) {
                throw error("expected a search term after OR");
            }
            parts.add(and());
        }
        return parts.size() == 1 ? parts.get(0) : new QueryNode.Or(parts);
    }

    private QueryNode and() {
        List<QueryNode> parts = new ArrayList<>();
        parts.add(unary());
        while (true) {
            skipSpace();
            if (atEndOfGroup() || peekKeyword("OR")) {
                break;
            }
            if (keyword("AND")) {
                skipSpace();
                if (atEndOfGroup() || peekKeyword("OR")) {
                    throw error("expected a search term after AND");
                }
            }
            parts.add(unary());
        }
        return parts.size() == 1 ? parts.get(0) : new QueryNode.And(parts);
    }

    private QueryNode unary() {
        skipSpace();
        int at = i + 1;
        if (keyword("NOT")) {
            skipSpace();
            if (atEndOfGroup()) {
                throw error("expected a search term after NOT");
            }
            return new QueryNode.Not(unary(), at);
        }
        if (i < q.length() && q.charAt(i) == '-' && i + 1 < q.length() && !Character.isWhitespace(q.charAt(i + 1))) {
            i++;
            return new QueryNode.Not(unary(), at);
        }
        return primary();
    }

    private QueryNode primary() {
        skipSpace();
        if (i >= q.length()) {
            throw error("expected a search term");
        }
        char c = q.charAt(i);
        int at = i + 1;
        if (c == '(') {
            i++;
            skipSpace();
            if (i < q.length() && q.charAt(i) == ')') {
                throw error("expected a search term inside the parentheses");
            }
            QueryNode inner = or();
            skipSpace();
            if (i >= q.length() || q.charAt(i) != ')') {
                throw new QuerySyntaxException(
                        q,
                        i >= q.length() ? q.length() + 1 : i + 1,
                        "expected ')' to close " + "the '(' at position " + at);
            }
            i++;
            return inner;
        }
        if (c == ')') {
            throw error("this ')' closes no '('");
        }
        if (c == '"') {
            return new QueryNode.Text(phrase(), true, at);
        }
        String word = word();
        int colon = word.indexOf(':');
        if (colon > 0 && word.substring(0, colon).chars().allMatch(Character::isLetter)) {
            return field(word.substring(0, colon), word.substring(colon + 1), at, at + colon + 1);
        }
        return new QueryNode.Text(word, false, at);
    }

    private QueryNode field(String name, String rest, int at, int valueAt) {
        String f = canonicalField(name.toLowerCase(java.util.Locale.ROOT), at);
        if (rest.isEmpty()) {
            if (i < q.length() && q.charAt(i) == '"') {
                return new QueryNode.Field(f, phrase(), true, at, valueAt);
            }
            throw new QuerySyntaxException(q, valueAt, "expected a value after '" + name + ":'" + example(f));
        }
        return new QueryNode.Field(f, rest, false, at, valueAt);
    }

    private String canonicalField(String name, int at) {
        if (FIELDS.contains(name)) {
            return name;
        }
        if (ALIASES.contains(name)) {
            return switch (name) {
                case "label" -> "route";
                case "colour" -> "color";
                case "facing" -> "grip";
                default -> name.substring(0, name.length() - 1);
            };
        }
        throw new QuerySyntaxException(
                q,
                at,
                "there is no field '" + name + "' (fields: "
                        + String.join(", ", FIELDS.stream().sorted().toList()) + ")");
    }

    private static String example(String field) {
        return switch (field) {
            case "grade" -> ", such as grade:V4 or grade:6a..6b+";
            case "set", "stripped", "standing" -> ", such as " + field + ":2026-03 or " + field + ":2026-01..2026-06";
            case "hold" -> ", such as hold:crimp or hold:pinch@90";
            case "grip" -> ", such as grip:down or grip:270";
            case "angle" -> ", such as angle:20..45";
            default -> "";
        };
    }

    private String phrase() {
        int open = i;
        i++;
        int end = q.indexOf('"', i);
        if (end < 0) {
            throw new QuerySyntaxException(q, open + 1, "this quote is not closed");
        }
        String p = q.substring(i, end);
        i = end + 1;
        if (p.isBlank()) {
            throw new QuerySyntaxException(q, open + 1, "expected words between the quotes");
        }
        return p;
    }

    private String word() {
        int start = i;
        while (i < q.length() && !Character.isWhitespace(q.charAt(i)) && "()\"".indexOf(q.charAt(i)) < 0) {
            i++;
        }
        return q.substring(start, i);
    }

    private boolean keyword(String k) {
        if (peekKeyword(k)) {
            i += k.length();
            return true;
        }
        return false;
    }

    private boolean peekKeyword(String k) {
        skipSpace();
        int end = i + k.length();
        return q.startsWith(k, i)
                && (end == q.length() || Character.isWhitespace(q.charAt(end)) || q.charAt(end) == '(');
    }

    private boolean atEndOfGroup() {
        return i >= q.length() || q.charAt(i) == ')';
    }

    private void skipSpace() {
        while (i < q.length() && Character.isWhitespace(q.charAt(i))) {
            i++;
        }
    }

    private QuerySyntaxException error(String what) {
        return new QuerySyntaxException(q, Math.min(i, q.length()) + 1, what);
    }
}
