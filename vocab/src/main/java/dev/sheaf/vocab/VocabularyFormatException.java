package dev.sheaf.vocab;

import java.io.IOException;

/**
 * A vocabulary file (our JSON, SKOS or CSV) that cannot be read: says where (file, line, column
 * — 1-based, 0 when unknown — and a path inside the document when known), what was expected and
 * what was found. Nothing is written when this is thrown.
 */
public final class VocabularyFormatException extends IOException {
    private static final long serialVersionUID = 1L;
    private final String file;
    private final int line;
    private final int column;
    private final String where;
    private final String problem;

    /**
     * @param file the file name as the user gave it
     * @param line 1-based line, 0 when unknown
     * @param column 1-based column, 0 when unknown
     * @param where a path inside the document ("concepts[3].broader"), or null
     * @param problem what was expected and what was found
     */
    public VocabularyFormatException(String file, int line, int column, String where, String problem, Throwable cause) {
        super(format(file, line, column, where, problem), cause);
        this.file = file;
        this.line = line;
        this.column = column;
        this.where = where;
        this.problem = problem;
    }

    private static String format(String file, int line, int column, String where, String problem) {
        StringBuilder sb = new StringBuilder(file == null ? "(input)" : file);
        if (line > 0) {
            sb.append(':').append(line);
            if (column > 0) {
                sb.append(':').append(column);
            }
        }
        sb.append(": ");
        if (where != null && !where.isEmpty()) {
            sb.append("at ").append(where).append(": ");
        }
        sb.append(problem);
        sb.append(" (nothing was changed; fix the file, or restore it from its backup ending in ~)");
        return sb.toString();
    }

    public String file() {
        return file;
    }

    public int line() {
        return line;
    }

    public int column() {
        return column;
    }

    /** The path inside the document, or null. */
    public String where() {
        return where;
    }

    /** What was expected and found, without the position. */
    public String problem() {
        return problem;
    }
}
