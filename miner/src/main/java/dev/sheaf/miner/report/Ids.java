package dev.sheaf.miner.report;

import java.util.regex.Pattern;

/** Identifiers the report makes from its own names: they end up in HTML ids, SVG ids and file names. */
final class Ids {
    private static final Pattern ID = Pattern.compile("[a-z][a-z0-9-]{0,63}");

    private Ids() {
    }

    static String require(String id, String what) {
        if (id == null || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException(what + " id must be 1-64 characters of a-z, 0-9 and '-', starting with a "
                    + "letter (it becomes an element id and a file name); got " + (id == null ? "null" : "'" + id + "'"));
        }
        return id;
    }
}
