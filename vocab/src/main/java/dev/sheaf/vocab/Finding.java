package dev.sheaf.vocab;

import java.util.List;
import java.util.Objects;

/**
 * One problem or piece of advice about a vocabulary.
 *
 * @param rule the rule that raised it
 * @param severity error, warning or info
 * @param concepts ids of the concepts involved (sorted; may be empty for file-level findings)
 * @param subject what the finding is about besides the concepts (a label, a term), or "" — part of its identity
 * @param message what is wrong, naming the concepts by label and id
 * @param hint how to fix it
 */
public record Finding(Rule rule, Severity severity, List<String> concepts, String subject, String message, String hint) {
    public Finding {
        Objects.requireNonNull(rule);
        Objects.requireNonNull(severity);
        concepts = concepts.stream().sorted().distinct().toList();
        subject = subject == null ? "" : subject;
        Objects.requireNonNull(message);
        Objects.requireNonNull(hint);
    }

    static Finding of(Rule rule, List<String> concepts, String subject, String message, String hint) {
        return new Finding(rule, rule.severity(), concepts, subject, message, hint);
    }

    /** Identity of the finding (rule, concepts, subject), independent of wording. */
    public String key() {
        return rule.id() + "|" + String.join(",", concepts) + "|" + subject;
    }
}
