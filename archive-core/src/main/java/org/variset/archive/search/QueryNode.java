package org.variset.archive.search;

import java.util.List;

/** The syntax tree of a query. */
sealed interface QueryNode {

    /** A bare word or phrase, searched as free text. */
    record Text(String text, boolean phrase, int position) implements QueryNode {}

    /** {@code field:value}; the value may be a phrase or a range {@code a..b}. */
    record Field(String field, String value, boolean phrase, int position, int valuePosition) implements QueryNode {}

    /** Every child must match; negated children must not. */
    record And(List<QueryNode> children) implements QueryNode {}

    /** At least one child must match. */
    record Or(List<QueryNode> children) implements QueryNode {}

    /** The child must not match. */
    record Not(QueryNode child, int position) implements QueryNode {}
}
