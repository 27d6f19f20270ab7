package dev.sheaf.miner.measure;

import dev.sheaf.miner.measure.CueLexicon.Role;
import dev.sheaf.miner.measure.CueLexicon.Unit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/** The rules of {@link MentionCues}, applied to one span of a tokenised sentence. */
final class MentionReader {

    /** The degree construction a term stands in. */
    private enum Construct { PLAIN, MORE, LESS, EQUATIVE, EXCESS, SUFFICIENT }

    private final ComparativeMorphology morphology;

    MentionReader(ComparativeMorphology morphology) {
        this.morphology = morphology;
    }

    /** Working state for one span. */
    private final class Reading {
        final CueTokens tokens;
        final List<Unit> units;
        final int s;
        final int clauseLeft;
        final int clauseRight;
        final int segmentLeft;
        final int segmentRight;
        final List<Cue> cues = new ArrayList<>();
        final List<String> notes = new ArrayList<>();
        Construct construct = Construct.PLAIN;
        boolean comparative;
        boolean modifier;
        boolean hedged;
        int negations;
        String excessWord = "too";

        Reading(CueTokens tokens, List<Unit> units, int s) {
            this.tokens = tokens;
            this.units = units;
            this.s = s;
            clauseLeft = edge(s, -1, false);
            clauseRight = edge(s, +1, false);
            segmentLeft = edge(s, -1, true);
            segmentRight = edge(s, +1, true);
        }

        /** Index of the farthest unit on one side of {@code from} still in its clause or segment. */
        private int edge(int from, int step, boolean segment) {
            int k = from;
            while (true) {
                int next = k + step;
                if (next < 0 || next >= units.size()) {
                    return k;
                }
                int boundaryToken = step < 0 ? units.get(k).from() : units.get(next).from();
                boolean[] breaks = segment ? tokens.segmentBreak : tokens.clauseBreak;
                Role r = units.get(next).role();
                if (breaks[boundaryToken] || r == Role.SEGMENT_BREAK || (!segment && r == Role.CLAUSE_BREAK)) {
                    return k;
                }
                k = next;
            }
        }

        Unit unit(int k) {
            return units.get(k);
        }

        void cue(CueKind kind, Unit u) {
            cue(kind, u.start(), u.end(), u.norm());
        }

        void cue(CueKind kind, Unit u, String normal) {
            cue(kind, u.start(), u.end(), normal);
        }

        void cue(CueKind kind, int start, int end, String normal) {
            cues.add(new Cue(kind, start, end, tokens.text.substring(start, end), normal));
        }
    }

    Mention read(CueTokens tokens, MentionSpan span) {
        String text = tokens.text.substring(span.start(), span.end());
        int from = -1;
        int to = -1;
        for (int i = 0; i < tokens.size(); i++) {
            CueTokens.Token t = tokens.get(i);
            if (t.end() > span.start() && t.start() < span.end()) {
                if (from < 0) {
                    from = i;
                }
                to = i + 1;
            }
        }
        if (from < 0) {
            return new Mention(span.start(), span.end(), text, Direction.PRESENT, false, false, false, false,
                    List.of(), List.of("the span holds no word; read as a plain mention"));
        }
        List<Unit> units = CueLexicon.units(tokens, from, to);
        int s = 0;
        while (units.get(s).role() != Role.SPAN) {
            s++;
        }
        Reading r = new Reading(tokens, units, s);
        // One word: the span's own text, so "hood" in the token "hood's" is read as "hood".
        String single = to - from == 1 && text.strip().indexOf(' ') < 0 ? ComparativeMorphology.normalise(text) : null;
        degree(r, single);
        negation(r, span);
        presence(r);
        hedges(r, single, span);
        return resolve(r, span, text);
    }

    private void degree(Reading r, String single) {
        if (single != null) {
            DegreeReading d = morphology.best(single);
            if (d.inflected()) {
                r.construct = Construct.MORE;
                r.comparative = true;
                r.cue(CueKind.DEGREE_FORM, r.unit(r.s), d.base());
            }
        }
        int after = afterSpan(r);
        chain:
        for (int k = r.s - 1; k >= r.clauseLeft; k--) {
            Unit u = r.unit(k);
            Role role = u.role();
            if (role == Role.INTENSIFIER || role == Role.FILLER || role == Role.HEDGE_DEGREE) {
                continue;
            }
            if (role == Role.SIDE_OPEN && after >= 0 && r.unit(after).norm().equals("side")) {
                continue;
            }
            boolean free = r.construct == Construct.PLAIN && !r.modifier;
            switch (role) {
                case MORE, MOST -> {
                    if (free) {
                        r.construct = Construct.MORE;
                        r.comparative = true;
                        r.cue(CueKind.MORE, u);
                    }
                    continue;
                }
                case LESS, LEAST -> {
                    if (free) {
                        r.construct = Construct.LESS;
                        r.comparative = true;
                        r.cue(CueKind.LESS, u);
                    }
                    continue;
                }
                case EXCESS -> {
                    if (free) {
                        r.construct = Construct.EXCESS;
                        r.excessWord = u.norm();
                        r.cue(CueKind.EXCESS, u);
                    }
                    continue;
                }
                case SUFFICIENT -> {
                    if (free) {
                        r.construct = Construct.SUFFICIENT;
                        r.cue(CueKind.SUFFICIENCY, u);
                    }
                    continue;
                }
                case EQUATIVE -> {
                    boolean closed = after >= 0 && r.unit(after).role() == Role.EQUATIVE;
                    if (free && (closed || negatedBefore(r, k))) {
                        r.construct = Construct.EQUATIVE;
                        r.comparative = true;
                        r.cue(CueKind.EQUATIVE, u);
                        if (closed) {
                            r.cue(CueKind.EQUATIVE, r.unit(after));
                        }
                        continue;
                    }
                    break chain;
                }
                case WORD -> {
                    if (free && u.to() - u.from() == 1) {
                        DegreeReading d = morphology.best(u.norm());
                        if (d.inflected()) {
                            r.modifier = true;
                            r.comparative = true;
                            r.cue(CueKind.DEGREE_FORM, u.start(), u.end(), d.base());
                            continue;
                        }
                    }
                    break chain;
                }
                default -> {
                    break chain;
                }
            }
        }
        afterDegree(r, single, after);
    }

    /** Cues after the term: "enough", "than", a predicate comparative ("the hood is smaller"). */
    private void afterDegree(Reading r, String single, int after) {
        if (after < 0) {
            return;
        }
        Unit u = r.unit(after);
        if (r.construct == Construct.PLAIN && !r.modifier && CueLexicon.COPULAS.contains(u.norm())) {
            predicate(r, after + 1);
            return;
        }
        if (u.role() == Role.SUFFICIENT && r.construct == Construct.PLAIN && !r.modifier) {
            r.construct = Construct.SUFFICIENT;
            r.cue(CueKind.SUFFICIENCY, u);
        } else if (u.role() == Role.THAN) {
            if (r.construct == Construct.PLAIN && !r.modifier && single != null) {
                Optional<DegreeReading> guess = morphology.beforeThan(single);
                if (guess.isPresent()) {
                    r.construct = Construct.MORE;
                    r.cue(CueKind.DEGREE_FORM, r.unit(r.s), guess.get().base());
                    r.notes.add("'" + single + "' read as a comparative of '" + guess.get().base()
                            + "' because 'than' follows; WordNet does not list that adjective");
                }
            }
            if (r.construct == Construct.MORE || r.construct == Construct.LESS || r.modifier) {
                r.comparative = true;
                r.cue(CueKind.THAN, u);
            }
        }
    }

    /**
     * "the hood is (a bit) smaller": a comparative predicate makes the subject's mention
     * comparative, as a comparative modifier does; degree hedges before it hedge the mention.
     */
    private void predicate(Reading r, int from) {
        List<Unit> hedges = new ArrayList<>(1);
        for (int k = from; k <= r.clauseRight; k++) {
            Unit u = r.unit(k);
            if (u.role() == Role.HEDGE_DEGREE) {
                hedges.add(u);
            } else if (u.role() != Role.INTENSIFIER && u.role() != Role.FILLER) {
                if (u.role() == Role.WORD && u.to() - u.from() == 1) {
                    DegreeReading d = morphology.best(u.norm());
                    if (d.inflected()) {
                        r.modifier = true;
                        r.comparative = true;
                        r.cue(CueKind.DEGREE_FORM, u, d.base());
                        for (Unit h : hedges) {
                            r.hedged = true;
                            r.cue(CueKind.HEDGE, h);
                        }
                    }
                }
                return;
            }
        }
    }

    /** Index of the unit right after the span if it is in the clause, else -1. */
    private static int afterSpan(Reading r) {
        return r.s + 1 <= r.clauseRight ? r.s + 1 : -1;
    }

    /** True when the nearest unit before {@code k} that is not an intensifier negates. */
    private static boolean negatedBefore(Reading r, int k) {
        for (int j = k - 1; j >= r.clauseLeft; j--) {
            Role role = r.unit(j).role();
            if (role == Role.INTENSIFIER) {
                continue;
            }
            return negates(role, true);
        }
        return false;
    }

    private static boolean negates(Role role, boolean before) {
        return switch (role) {
            case NEGATION, ABSENCE_BEFORE -> before;
            case ABSENCE_AFTER -> !before;
            case ABSENCE_EITHER -> true;
            default -> false;
        };
    }

    private static void negation(Reading r, MentionSpan span) {
        Unit term = r.unit(r.s);
        for (int k = r.s - 1; k >= r.clauseLeft; k--) {
            Unit u = r.unit(k);
            if (term.from() - u.to() > MentionCues.NEGATION_WINDOW) {
                break;
            }
            if (negates(u.role(), true)) {
                r.negations++;
                r.cue(u.role() == Role.NEGATION ? CueKind.NEGATION : CueKind.ABSENCE, u);
            }
        }
        for (int k = r.s + 1; k <= r.clauseRight; k++) {
            Unit u = r.unit(k);
            if (u.from() - term.to() > MentionCues.AFTER_WINDOW) {
                break;
            }
            boolean clauseFinal = k == r.clauseRight;
            if (u.role() == Role.ABSENCE_AFTER || (u.role() == Role.ABSENCE_EITHER && clauseFinal)) {
                r.negations++;
                r.cue(CueKind.ABSENCE, u);
            }
        }
        String rest = r.tokens.text.substring(span.end());
        if (suffix(rest, "-free")) {
            r.negations++;
            r.cue(CueKind.ABSENCE, span.end(), span.end() + 5, "-free");
        }
    }

    private static void presence(Reading r) {
        Unit term = r.unit(r.s);
        for (int k = r.s - 1; k >= r.clauseLeft; k--) {
            Unit u = r.unit(k);
            if (term.from() - u.to() > MentionCues.NEGATION_WINDOW) {
                break;
            }
            if (u.role() == Role.PRESENCE) {
                r.cue(CueKind.PRESENCE, u);
            }
        }
    }

    private void hedges(Reading r, String single, MentionSpan span) {
        boolean gradable = r.construct != Construct.PLAIN || r.modifier
                || morphology.gradable(r.tokens.norm(r.unit(r.s).to() - 1));
        if (gradable) {
            for (int k = r.s - 1; k >= r.clauseLeft; k--) {
                Unit u = r.unit(k);
                Role role = u.role();
                if (role == Role.HEDGE_DEGREE) {
                    r.hedged = true;
                    r.cue(CueKind.HEDGE, u);
                } else if (!skippable(role) && !r.cues.stream().anyMatch(c -> c.start() == u.start())) {
                    break;
                }
            }
        }
        if (single != null && morphology.ishBase(single).isPresent()) {
            Unit u = r.unit(r.s);
            r.hedged = true;
            r.cue(CueKind.HEDGE, u.end() - 3, u.end(), "-" + HedgeWords.ISH);
        } else if (suffix(r.tokens.text.substring(span.end()), "-" + HedgeWords.ISH)) {
            r.hedged = true;
            r.cue(CueKind.HEDGE, span.end(), span.end() + 4, "-" + HedgeWords.ISH);
        }
        for (int k = r.segmentLeft; k <= r.segmentRight; k++) {
            Unit u = r.unit(k);
            if (u.role() == Role.HEDGE_EPISTEMIC) {
                r.hedged = true;
                r.cue(CueKind.HEDGE, u);
            }
        }
    }

    private static boolean skippable(Role role) {
        return role == Role.INTENSIFIER || role == Role.FILLER || role == Role.HEDGE_DEGREE || role == Role.SIDE_OPEN;
    }

    private static Mention resolve(Reading r, MentionSpan span, String text) {
        boolean negated = r.negations % 2 == 1;
        if (r.negations >= 2) {
            r.notes.add(r.negations + " negations cancel" + (negated ? " but one" : "")
                    + "; polarity follows their count");
        }
        Direction direction;
        boolean excessive = false;
        switch (r.construct) {
            case MORE -> direction = negated ? Direction.LESS : Direction.MORE;
            case LESS -> direction = negated ? Direction.MORE : Direction.LESS;
            case EQUATIVE -> {
                direction = negated ? Direction.LESS : Direction.PRESENT;
                r.notes.add(negated ? "'not as X' read as LESS" : "'as X as' states equality; read as PRESENT");
            }
            case EXCESS -> {
                excessive = !negated;
                direction = negated ? Direction.PRESENT : Direction.MORE;
                r.notes.add(negated ? "'not " + r.excessWord + " X' denies the excess, not the attribute; read as PRESENT"
                        : "'" + r.excessWord + "' marks an excess; counted as MORE");
            }
            case SUFFICIENT -> {
                direction = negated ? Direction.LESS : Direction.PRESENT;
                if (negated) {
                    r.notes.add("'not enough' read as LESS");
                }
            }
            default -> direction = negated ? Direction.ABSENT : Direction.PRESENT;
        }
        List<Cue> cues = new ArrayList<>(r.cues.size());
        r.cues.stream()
                .sorted(Comparator.comparingInt(Cue::start).thenComparingInt(Cue::end).thenComparing(c -> c.kind()))
                .forEach(c -> {
                    if (cues.isEmpty() || !cues.get(cues.size() - 1).equals(c)) {
                        cues.add(c);
                    }
                });
        return new Mention(span.start(), span.end(), text, direction, r.comparative, r.hedged, excessive, negated,
                cues, r.notes);
    }

    /** Hedges of a whole sentence, for reporting. */
    List<Cue> hedges(CueTokens tokens) {
        List<Unit> units = CueLexicon.units(tokens, -1, -1);
        List<Cue> out = new ArrayList<>();
        for (int k = 0; k < units.size(); k++) {
            Unit u = units.get(k);
            switch (u.role()) {
                case HEDGE_EPISTEMIC -> out.add(cue(tokens, u.start(), u.end(), u.norm()));
                case HEDGE_DEGREE -> {
                    if (gradableAfter(tokens, units, k)) {
                        out.add(cue(tokens, u.start(), u.end(), u.norm()));
                    }
                }
                case WORD -> {
                    if (morphology.ishBase(u.norm()).isPresent()) {
                        out.add(cue(tokens, u.end() - 3, u.end(), "-" + HedgeWords.ISH));
                    } else if (u.norm().equals(HedgeWords.ISH) && k > 0 && u.start() > 0
                            && tokens.text.charAt(u.start() - 1) == '-'
                            && units.get(k - 1).end() == u.start() - 1
                            && morphology.gradable(units.get(k - 1).norm())) {
                        out.add(cue(tokens, u.start() - 1, u.end(), "-" + HedgeWords.ISH));
                    }
                }
                default -> {
                }
            }
        }
        return List.copyOf(out);
    }

    /** True when, skipping intensifiers, articles and other hedges, a gradable word follows unit k. */
    private boolean gradableAfter(CueTokens tokens, List<Unit> units, int k) {
        for (int j = k + 1; j < units.size(); j++) {
            Unit u = units.get(j);
            if (tokens.clauseBreak[u.from()]) {
                return false;
            }
            switch (u.role()) {
                case INTENSIFIER, FILLER, HEDGE_DEGREE -> {
                    continue;
                }
                case MORE, MOST, LESS, LEAST, EXCESS, SUFFICIENT, EQUATIVE -> {
                    return true;
                }
                case WORD -> {
                    return u.to() - u.from() == 1 && (morphology.gradable(u.norm())
                            || morphology.best(u.norm()).inflected() || morphology.ishBase(u.norm()).isPresent());
                }
                default -> {
                    return false;
                }
            }
        }
        return false;
    }

    private static Cue cue(CueTokens tokens, int start, int end, String normal) {
        return new Cue(CueKind.HEDGE, start, end, tokens.text.substring(start, end), normal);
    }

    /** True when {@code rest} starts with {@code suffix} (case-insensitive) not followed by a letter. */
    private static boolean suffix(String rest, String suffix) {
        if (!rest.regionMatches(true, 0, suffix, 0, suffix.length())) {
            return false;
        }
        return rest.length() == suffix.length() || !Character.isLetterOrDigit(rest.charAt(suffix.length()));
    }
}
