package dev.sheaf.vocab;

import java.util.Locale;

/** How bad a finding is. Only errors make {@code sheaf check} exit with "findings". */
public enum Severity {
    /** Breaks a SKOS integrity condition or makes labeling ambiguous; fix before shipping. */
    ERROR,
    /** Against thesaurus practice; usually worth fixing. */
    WARNING,
    /** Advice or a note (regulated claims, what an import could not carry). */
    INFO;

    /** error, warning, info */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }
}
