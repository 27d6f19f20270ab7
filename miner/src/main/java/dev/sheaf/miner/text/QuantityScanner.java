package dev.sheaf.miner.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One left-to-right pass over a text that finds quantities with units. No regular expressions: a
 * hand-rolled cursor with bounded look-ahead and look-behind, so the cost is linear in the text and
 * ordinary prose (letters) is skipped a word at a time. Not thread-safe; one instance per text.
 *
 * <p>The rules for ambiguous spellings (in, ", ', bare F/C, D, P, mm as water column, decimal
 * commas) are in docs/decisions/061 and 062; the comments here say which rule a branch applies.
 */
final class QuantityScanner {
    private static final char NONE = '\uFFFF';
    private static final int WORD = 0;
    private static final int SYMBOL = 1;
    private static final int BARE = 2;

    /** Denominators accepted in written fractions (1/2, 3/8, 1/16 ...): the ones trade measures use. */
    private static final int[] DENOMINATORS = {2, 3, 4, 5, 6, 8, 10, 12, 16, 32, 64};
    private static final String[] NUMBER_WORDS = {"one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten"};
    /** Words after "N in" that show "in" is the inch ("7 in long"), not the preposition ("2 in the bag"). */
    private static final String[] INCH_FOLLOWERS = {"x", "by", "long", "wide", "tall", "high", "deep", "thick",
            "diameter", "dia", "length", "width", "height", "across"};
    private static final String[] APPROX_WORDS = {"approx", "approximately", "about", "around", "circa"};
    private static final String[] TEMPERATURE_CUES = {"comfort", "limit", "extreme", "rated", "rating", "temp", "survival", "lower"};
    private static final String[] WATER_CUES = {"hydrostatic", "waterproof", "water column", "water-column",
            "water resist", "water-resist", "h2o", "h\u2082o"};
    /** A water column read from cue words alone must be at least this many mm: real ratings are 800 mm and up, poles are 8.5 mm. */
    private static final long WATER_CUE_MIN = 500;
    /** From this many mm on, a bare "mm" value is a water column unless a length cue is near: lengths of 5 m and more are not written in mm in this trade. */
    private static final long WATER_BARE_MIN = 5000;
    private static final String[] LENGTH_CUES = {"length", "long", "width", "wide", "height", "tall", "diameter", "dimension", "size"};
    /** Longer numbers are not read: no spec value has 16 significant digits, and 15 keep every value exact in a double. */
    private static final int MAX_DIGITS = 15;

    private final CharSequence text;
    private final int len;
    /** Extra text searched for cue words (a spec key), lower-cased with Locale.ROOT. */
    private final String context;
    private final String contextRaw;
    private final List<Quantity> out = new ArrayList<>(4);
    private int lastTemperatureEnd = -1;
    /** Where to resume after a number that was read but rejected. */
    private int resume;

    /** A number as read: [start, end) and its exact value. */
    private static final class Num {
        final int start;
        final int end;
        final QuantityValue value;
        final boolean integer;
        final boolean kilo;

        Num(int start, int end, QuantityValue value, boolean integer, boolean kilo) {
            this.start = start;
            this.end = end;
            this.value = value;
            this.integer = integer;
            this.kilo = kilo;
        }
    }

    /** A unit as read after a number: which one, where it ends, how it was written. */
    private static final class Hit {
        final UnitDef def;
        final int end;
        final int form;
        final boolean attached;

        Hit(UnitDef def, int end, int form, boolean attached) {
            this.def = def;
            this.end = end;
            this.form = form;
            this.attached = attached;
        }
    }

    QuantityScanner(CharSequence text, String context) {
        this.text = text;
        this.len = text.length();
        this.context = context == null ? "" : context.toLowerCase(Locale.ROOT);
        this.contextRaw = context == null ? "" : context;
    }

    List<Quantity> run() {
        int i = 0;
        while (i < len) {
            char c = text.charAt(i);
            if (isDigit(c) || (c >= '\u00BC' && vulgar(c) != null)) {
                if (i > 0 && Character.isLetterOrDigit(text.charAt(i - 1))) {
                    i = alnumEnd(i);   // part of a code such as "X200" or "FH-000123b"
                    continue;
                }
                if (i > 0 && (text.charAt(i - 1) == '.' || (text.charAt(i - 1) == ',' && i > 1 && isDigit(text.charAt(i - 2))))) {
                    i = numberRunEnd(i);   // "v1.2", ".5": the tail of something else, not a number of its own
                    continue;
                }
                i = Math.max(i + 1, atNumber(i));
            } else if (isAsciiLetter(c)) {
                int e = asciiWordEnd(i);
                if (i == 0 || !Character.isLetterOrDigit(text.charAt(i - 1))) {
                    int r = atWord(i, e);
                    if (r > e) {
                        i = r;
                        continue;
                    }
                }
                i = e;
            } else {
                i++;
            }
        }
        return out;
    }

    // ---------------------------------------------------------------- numbers

    private int atNumber(int i) {
        Num n1 = number(i);
        if (n1 == null) {
            return resume;
        }
        Hit u = unitAfter(n1.end, n1);
        if (u != null) {
            return single(n1, u);
        }
        int r = range(n1);
        if (r > 0) {
            return r;
        }
        int d = chain(n1);
        if (d > 0) {
            return d;
        }
        return n1.end;
    }

    /**
     * Reads a number at i: digits with grouping (1,200 / 10,000 / 1 200 with a thin or no-break
     * space), a decimal point, fractions (½, 1/2, 1½, 1 1/2, 1-1/2) and a "k" multiplier (10k).
     * A comma that is not a thousands separator (1,2 / 1,2345 / 1.200,5) makes the whole number
     * unreadable (decision 061): it returns null and sets {@link #resume} past the number.
     */
    private Num number(int i) {
        char c = at(i);
        QuantityValue frac = vulgar(c);
        if (frac != null) {
            return new Num(i, i + 1, frac, false, false);
        }
        int p = i;
        long unscaled = 0;
        int digits = 0;
        int scale = 0;
        char groupSep = 0;
        int groupLen = 0;
        boolean dot = false;
        boolean bad = false;
        while (true) {
            char ch = at(p);
            if (isDigit(ch)) {
                if (digits < MAX_DIGITS) {
                    unscaled = unscaled * 10 + (ch - '0');
                } else {
                    bad = true;   // refuse rather than round
                }
                digits++;
                groupLen++;
                if (dot) {
                    scale++;
                }
                p++;
            } else if (ch == '.' && isDigit(at(p + 1))) {
                if (dot || (groupSep != 0 && groupLen != 3)) {
                    bad = true;
                }
                dot = true;
                groupLen = 0;
                p++;
            } else if ((ch == ',' && isDigit(at(p + 1))) || (isGroupSpace(ch) && threeDigitsThenEnd(p + 1))) {
                char sep = ch == ',' ? ',' : ' ';
                if (dot) {
                    bad = true;   // 1.200,5: European grouping, not read
                } else if (groupSep == 0) {
                    if (groupLen > 3) {
                        bad = true;
                    }
                    groupSep = sep;
                } else if (sep != groupSep || groupLen != 3) {
                    bad = true;
                }
                groupLen = 0;
                p++;
            } else {
                break;
            }
        }
        if (groupSep != 0 && !dot && groupLen != 3) {
            bad = true;   // 1,2 or 1,2345: a decimal comma, or not a number we can read safely
        }
        if (bad) {
            resume = p;
            return null;
        }
        QuantityValue value = QuantityValue.decimal(unscaled, scale);
        if (groupSep == 0 && !dot) {
            char ch = at(p);
            if ((ch == '/' || ch == '\u2044') && isDigit(at(p + 1))) {
                int q = p + 1;
                long den = 0;
                while (isDigit(at(q)) && q - p < 10) {
                    den = den * 10 + (at(q) - '0');
                    q++;
                }
                if (isDigit(at(q)) || ((at(q) == '/' || at(q) == '.') && isDigit(at(q + 1)))) {
                    int r = q;
                    while (isDigit(at(r)) || ((at(r) == '/' || at(r) == '.') && isDigit(at(r + 1)))) {
                        r++;
                    }
                    resume = r;   // a date or a code like 12/05/2024, not a quantity
                    return null;
                }
                if (properFraction(unscaled, den)) {
                    return new Num(i, q, QuantityValue.of(unscaled, den), false, false);
                }
                return new Num(i, p, value, true, false);   // 20/25: two numbers, not a fraction
            }
            QuantityValue f = vulgar(ch);
            if (f != null) {
                return new Num(i, p + 1, value.plus(f), false, false);
            }
            if (ch == ' ' || ch == '-' || isGroupSpace(ch)) {
                f = vulgar(at(p + 1));
                if (f != null) {
                    return new Num(i, p + 2, value.plus(f), false, false);
                }
                int q = p + 1;
                long num = 0;
                while (isDigit(at(q)) && q - p < 4) {
                    num = num * 10 + (at(q) - '0');
                    q++;
                }
                if (q > p + 1 && (at(q) == '/' || at(q) == '\u2044') && isDigit(at(q + 1))) {
                    int r = q + 1;
                    long den = 0;
                    while (isDigit(at(r)) && r - q < 4) {
                        den = den * 10 + (at(r) - '0');
                        r++;
                    }
                    if (!isDigit(at(r)) && at(r) != '/' && properFraction(num, den)) {
                        return new Num(i, r, value.plus(QuantityValue.of(num, den)), false, false);
                    }
                }
            }
        }
        char k = at(p);
        if ((k == 'k' || k == 'K') && !Character.isLetterOrDigit(at(p + 1))) {
            return new Num(i, p + 1, value, !dot, true);
        }
        return new Num(i, p, value, !dot, false);
    }

    private static boolean properFraction(long num, long den) {
        if (num < 1 || num >= den) {
            return false;
        }
        for (int d : DENOMINATORS) {
            if (d == den) {
                return true;
            }
        }
        return false;
    }

    private boolean threeDigitsThenEnd(int q) {
        return isDigit(at(q)) && isDigit(at(q + 1)) && isDigit(at(q + 2)) && !isDigit(at(q + 3))
                && at(q + 3) != '/' && at(q + 3) != '\u2044';
    }

    // ---------------------------------------------------------------- units

    /** The unit written right after a number (attached, after up to two spaces, or after one hyphen), or null. */
    private Hit unitAfter(int p0, Num n) {
        int p = p0;
        if (at(p) == '-') {
            p++;
        } else {
            while (isSpace(at(p)) && p - p0 < 2) {
                p++;
            }
        }
        boolean attached = p == p0;
        char c = at(p);
        if (c == '\u00B0' || c == '\u00BA' || c == '\u02DA') {
            int q = p + 1;
            if (at(q) == ' ') {
                q++;
            }
            return temperatureLetter(q, attached, SYMBOL);
        }
        if (c == '\u2103') {
            return new Hit(UnitTable.CELSIUS, p + 1, SYMBOL, attached);
        }
        if (c == '\u2109') {
            return new Hit(UnitTable.FAHRENHEIT, p + 1, SYMBOL, attached);
        }
        if (c == '"' || c == '\u2033') {
            return attached && !insideQuotation(n.start, c) ? new Hit(UnitTable.INCH, p + 1, SYMBOL, true) : null;
        }
        if (c == '\'' || c == '\u2032') {
            return attached && !Character.isLetter(at(p + 1)) && !insideQuotation(n.start, c)
                    ? new Hit(UnitTable.FOOT, p + 1, SYMBOL, true) : null;
        }
        if (!isAsciiLetter(c)) {
            return null;
        }
        int e = asciiWordEnd(p);
        if (e - p > 12) {
            return null;
        }
        if (e - p == 1) {
            return oneLetter(c, p, e, attached);
        }
        String w = lowerAscii(p, e);
        boolean us = false;
        if (w.equals("us")) {   // "US fl oz", "US gal"
            int q = skipSpaces(e, 1);
            if (q == e || !isAsciiLetter(at(q))) {
                return null;
            }
            p = q;
            e = asciiWordEnd(q);
            w = lowerAscii(p, e);
            us = true;
        }
        Hit h = multiWord(w, p, e, attached);
        if (h == null && w.equals("in")) {
            return null;   // the preposition, not the inch
        }
        if (h == null) {
            UnitDef def = UnitTable.word(w);
            h = def == null || !boundary(e) ? null : new Hit(def, e, WORD, attached);
        }
        if (h != null && us && h.def != UnitTable.FLUID_OUNCE && h.def != UnitTable.GALLON) {
            return null;
        }
        if (h != null && at(h.end) == '/' && isAsciiLetter(at(h.end + 1))) {
            return null;   // a rate or density: g/m², lm/W, mL/min — not this unit
        }
        return h;
    }

    private Hit oneLetter(char c, int p, int e, boolean attached) {
        UnitDef def;
        int form = WORD;
        switch (c) {
            case 'g': def = UnitTable.GRAM; break;
            case 'm': def = UnitTable.METRE; break;
            case 'l': case 'L': def = UnitTable.LITRE; break;
            case 'h': def = UnitTable.HOUR; break;
            case 'D': def = UnitTable.DENIER; form = BARE; break;
            case 'P': def = UnitTable.PERSON; form = BARE; break;
            case 'F': def = UnitTable.FAHRENHEIT; form = BARE; break;
            case 'C': def = UnitTable.CELSIUS; form = BARE; break;
            default: return null;
        }
        if (!boundary(e) || (at(e) == '/' && isAsciiLetter(at(e + 1)))) {
            return null;
        }
        return new Hit(def, e, form, attached);
    }

    private Hit temperatureLetter(int q, boolean attached, int form) {
        if (!isAsciiLetter(at(q))) {
            return null;
        }
        int e = asciiWordEnd(q);
        String w = lowerAscii(q, e);
        if (!boundary(e)) {
            return null;
        }
        if (w.equals("f") || w.equals("fahrenheit")) {
            return new Hit(UnitTable.FAHRENHEIT, e, form, attached);
        }
        if (w.equals("c") || w.equals("celsius")) {
            return new Hit(UnitTable.CELSIUS, e, form, attached);
        }
        return null;
    }

    /** Units written as two words or with a suffix: fl oz, cu in, deg F, fill power, mm H2O, in³, cm³, and "in" itself. */
    private Hit multiWord(String w, int p, int e, boolean attached) {
        switch (w) {
            case "fl": case "fluid": {
                int e2 = nextWordAfter(e);
                String w2 = e2 < 0 ? "" : lowerAscii(wordStart, e2);
                return (w2.equals("oz") || w2.equals("ounce") || w2.equals("ounces")) && boundary(e2)
                        ? new Hit(UnitTable.FLUID_OUNCE, e2, WORD, attached) : null;
            }
            case "cu": case "cubic": {
                int e2 = nextWordAfter(e);
                String w2 = e2 < 0 ? "" : lowerAscii(wordStart, e2);
                if (!boundary(e2)) {
                    return null;
                }
                if (w2.equals("in") || w2.equals("inch") || w2.equals("inches")) {
                    return new Hit(UnitTable.CUBIC_INCH, e2, WORD, attached);
                }
                if (w2.equals("cm") || w2.startsWith("centimet")) {
                    return new Hit(UnitTable.CUBIC_CENTIMETRE, e2, WORD, attached);
                }
                return null;
            }
            case "deg": case "degree": case "degrees": {
                int q = at(e) == '.' ? e + 1 : e;
                q = skipSpaces(q, 1);
                return temperatureLetter(q, attached, SYMBOL);
            }
            case "fill": {
                if ((at(e) == '-' || at(e) == ' ') && isAsciiLetter(at(e + 1))) {
                    int e2 = asciiWordEnd(e + 1);
                    if (lowerAscii(e + 1, e2).equals("power") && boundary(e2)) {
                        return new Hit(UnitTable.FILL_POWER, e2, WORD, attached);
                    }
                }
                return boundary(e) ? new Hit(UnitTable.FILL_POWER, e, WORD, attached) : null;
            }
            case "mm": {
                int q = skipSpaces(e, 1);
                if (regionIs(q, "h2o") || regionIs(q, "h\u2082o")) {
                    return boundary(q + 3) ? new Hit(UnitTable.MM_WATER, q + 3, WORD, attached) : null;
                }
                if (regionIs(q, "w.c.")) {
                    return new Hit(UnitTable.MM_WATER, q + 4, WORD, attached);
                }
                if (q > e && regionIs(q, "wc") && boundary(q + 2)) {
                    return new Hit(UnitTable.MM_WATER, q + 2, WORD, attached);
                }
                return null;   // plain mm: the word table; water column by cue in single()
            }
            case "in": case "cm": {
                char s = at(e);
                if (s == '\u00B3' || (s == '3' && !Character.isLetterOrDigit(at(e + 1)))) {
                    return new Hit(w.equals("in") ? UnitTable.CUBIC_INCH : UnitTable.CUBIC_CENTIMETRE, e + 1, WORD, attached);
                }
                if (w.equals("in")) {
                    return inchWord(e, attached);
                }
                return null;
            }
            default:
                return null;
        }
    }

    /** "in" is the inch when the text after it cannot continue a preposition: end, punctuation, or a size word (decision 062). */
    private Hit inchWord(int e, boolean attached) {
        char c = at(e);
        if (c == '-' || Character.isLetterOrDigit(c) || c == '\u00B2') {
            return null;   // 2-in-1
        }
        if (c == '.') {
            return new Hit(UnitTable.INCH, e, WORD, attached);
        }
        int r = e;
        while (r < len && isSpace(at(r))) {
            r++;
        }
        if (r >= len) {
            return new Hit(UnitTable.INCH, e, WORD, attached);
        }
        char n = at(r);
        if (isDigit(n)) {
            return null;   // 2 in 1
        }
        if (Character.isLetter(n)) {
            if (afterTimes) {
                return new Hit(UnitTable.INCH, e, WORD, attached);
            }
            if (!isAsciiLetter(n)) {
                return null;
            }
            String next = lowerAscii(r, asciiWordEnd(r));
            for (String f : INCH_FOLLOWERS) {
                if (f.equals(next)) {
                    return new Hit(UnitTable.INCH, e, WORD, attached);
                }
            }
            return null;   // 2 in the bag
        }
        return new Hit(UnitTable.INCH, e, WORD, attached);
    }

    private int wordStart;
    /** True while reading the unit after the last factor of "84 x 52 x 40". */
    private boolean afterTimes;

    /** After an optional dot and up to two spaces, the end of the next ASCII word (its start in {@link #wordStart}), or -1. */
    private int nextWordAfter(int e) {
        int q = at(e) == '.' ? e + 1 : e;
        q = skipSpaces(q, 2);
        if (!isAsciiLetter(at(q))) {
            return -1;
        }
        wordStart = q;
        return asciiWordEnd(q);
    }

    // ---------------------------------------------------------------- quantities

    private int single(Num n1, Hit u) {
        if (u.def == UnitTable.POUND || u.def == UnitTable.FOOT) {
            int c = compound(n1, u);
            if (c > 0) {
                return c;
            }
        }
        UnitDef def = u.def;
        QuantityValue v = n1.value;
        if (n1.kilo) {
            if (def != UnitTable.MILLIMETRE) {
                return u.end;   // 10k steps, 5K run: not a unit we read with a multiplier
            }
            def = UnitTable.MM_WATER;
            v = v.times(1000);
        } else if (def == UnitTable.MILLIMETRE && waterColumn(v, n1.start, u.end)) {
            def = UnitTable.MM_WATER;
        }
        int sign = def.dimension() == Dimension.TEMPERATURE ? signBefore(n1.start) : -1;
        if (v == null) {
            return u.end;
        }
        if (sign >= 0) {
            v = v.negate();
        }
        int start = sign >= 0 ? sign : n1.start;
        if (!plausible(def, u, n1, v, v, start, u.end)) {
            return u.end;
        }
        emit(def, start, u.end, v, v);
        return u.end;
    }

    /** 2 lb 10 oz, 1 lb. 4 oz, 5' 10", 6 ft 2 in: stated in the smaller unit (decision 060). */
    private int compound(Num n1, Hit u) {
        int p = u.end;
        if (at(p) == '.' && u.def == UnitTable.POUND) {
            p++;
        }
        int q = skipSpaces(p, 2);
        if (!isDigit(at(q))) {
            return -1;
        }
        Num n2 = number(q);
        if (n2 == null || n2.kilo) {
            return -1;
        }
        Hit u2 = unitAfter(n2.end, n2);
        UnitDef small = u.def == UnitTable.POUND ? UnitTable.OUNCE : UnitTable.INCH;
        if (u2 == null || u2.def != small) {
            return -1;
        }
        QuantityValue big = n1.value.times(u.def == UnitTable.POUND ? 16 : 12);
        QuantityValue total = big == null ? null : big.plus(n2.value);
        if (total == null) {
            return -1;
        }
        emit(small, n1.start, u2.end, total, total);
        return u2.end;
    }

    /** 1.1–1.3 kg, 20-25 L, 20 to 25 L, -9 to -2 °C, 3-4 season. */
    private int range(Num n1) {
        int p = skipSpaces(n1.end, 2);
        char c = at(p);
        int q;
        if (c == '-' || c == '\u2013' || c == '\u2014') {
            q = p + 1;
        } else if (p > n1.end && (c == 't' || c == 'T') && (at(p + 1) == 'o' || at(p + 1) == 'O') && isSpace(at(p + 2))) {
            q = p + 2;
        } else {
            return -1;
        }
        q = skipSpaces(q, 2);
        int sign2 = -1;
        if ((at(q) == '-' || at(q) == '\u2212') && isDigit(at(q + 1))) {
            sign2 = q;
            q++;
        }
        if (!isDigit(at(q)) && vulgar(at(q)) == null) {
            return -1;
        }
        Num n2 = number(q);
        if (n2 == null || n2.kilo != n1.kilo) {
            return -1;
        }
        Hit u = unitAfter(n2.end, n2);
        if (u == null) {
            return -1;
        }
        UnitDef def = u.def;
        QuantityValue lo = n1.value;
        QuantityValue hi = n2.value;
        if (n1.kilo) {
            if (def != UnitTable.MILLIMETRE) {
                return -1;
            }
            def = UnitTable.MM_WATER;
            lo = lo.times(1000);
            hi = hi.times(1000);
        } else if (def == UnitTable.MILLIMETRE && waterColumn(lo, n1.start, u.end)) {
            def = UnitTable.MM_WATER;
        }
        int start = n1.start;
        if (def.dimension() == Dimension.TEMPERATURE) {
            int sign = signBefore(n1.start);
            if (sign >= 0) {
                lo = lo.negate();
                start = sign;
            }
            if (sign2 >= 0) {
                hi = hi.negate();
            }
        } else if (sign2 >= 0) {
            return -1;
        }
        if (lo.compareTo(hi) > 0 || !plausible(def, u, n1, lo, hi, start, u.end) || (!n2.integer && needsInteger(def))) {
            return -1;
        }
        emit(def, start, u.end, lo, hi);
        return u.end;
    }

    /** 84 x 52 x 40 in: every factor is a length in the unit written after the last one (decision 060). */
    private int chain(Num n1) {
        Num[] factors = new Num[3];
        factors[0] = n1;
        int count = 1;
        int p = n1.end;
        while (count < 3) {
            int q = skipSpaces(p, 2);
            char c = at(q);
            if (!(c == '\u00D7' || ((c == 'x' || c == 'X') && !isAsciiLetter(at(q + 1))))) {
                return -1;
            }
            q = skipSpaces(q + 1, 2);
            if (!isDigit(at(q))) {
                return -1;
            }
            Num n = number(q);
            if (n == null || n.kilo) {
                return -1;
            }
            factors[count++] = n;
            afterTimes = true;   // after "84 x 52 x 40", "in" is the inch whatever word follows
            Hit u = unitAfter(n.end, n);
            afterTimes = false;
            if (u != null) {
                if (u.def.dimension() != Dimension.LENGTH) {
                    return -1;
                }
                for (int k = 0; k < count; k++) {
                    Num f = factors[k];
                    emit(u.def, f.start, k == count - 1 ? u.end : f.end, f.value, f.value);
                }
                return u.end;
            }
            p = n.end;
        }
        return -1;
    }

    /** FP 800; and number words before person/season: two-person, three season. */
    private int atWord(int i, int e) {
        int wl = e - i;
        if (wl < 2 || wl > 5) {
            return e;
        }
        // Most words are neither: decide without allocating (this runs for every word of the corpus).
        if (wl == 2 && regionIs(i, "fp")) {
            int q = e;
            if (at(q) == ':' || at(q) == '-') {
                q++;
            }
            q = skipSpaces(q, 2);
            if (!isDigit(at(q))) {
                return e;
            }
            Num n = number(q);
            if (n == null || n.kilo || Character.isLetterOrDigit(at(n.end)) || !n.integer || !fillPower(n.value)) {
                return e;
            }
            emit(UnitTable.FILL_POWER, i, n.end, n.value, n.value);
            return n.end;
        }
        int value = -1;
        char next = (char) (at(e + 1) | 0x20);
        if ((at(e) == '-' || at(e) == ' ') && (next == 'p' || next == 's')) {   // two-person, three season
            for (int k = 0; k < NUMBER_WORDS.length && value < 0; k++) {
                if (NUMBER_WORDS[k].length() == wl && regionIs(i, NUMBER_WORDS[k])) {
                    value = k + 1;
                }
            }
        }
        if (value < 0 || !(at(e) == '-' || at(e) == ' ') || !isAsciiLetter(at(e + 1))) {
            return e;
        }
        int e2 = asciiWordEnd(e + 1);
        UnitDef def = UnitTable.word(lowerAscii(e + 1, e2));
        if ((def != UnitTable.PERSON && def != UnitTable.SEASON) || !boundary(e2)) {
            return e;
        }
        QuantityValue v = QuantityValue.of(value, 1);
        if (def == UnitTable.SEASON && value > 4) {
            return e;
        }
        emit(def, i, e2, v, v);
        return e2;
    }

    private boolean plausible(UnitDef def, Hit u, Num n1, QuantityValue lo, QuantityValue hi, int start, int end) {
        if (lo == null || hi == null) {
            return false;   // overflowed while scaling
        }
        if (needsInteger(def) && !n1.integer) {
            return false;
        }
        if (def == UnitTable.DENIER) {
            return u.form != BARE || (u.attached && lo.compareTo(5) >= 0);   // 3D mesh is not 3 denier
        }
        if (def == UnitTable.PERSON) {
            return lo.signum() > 0 && hi.compareTo(u.form == BARE ? 12 : 20) <= 0 && (u.form != BARE || u.attached);
        }
        if (def == UnitTable.SEASON) {
            return lo.signum() > 0 && hi.compareTo(4) <= 0;
        }
        if (def == UnitTable.FILL_POWER) {
            return fillPower(lo) && fillPower(hi);
        }
        if (def.dimension() == Dimension.TEMPERATURE && u.form == BARE) {
            return lo.compareTo(-100) >= 0 && hi.compareTo(150) <= 0
                    && (dualBefore(start) || dualAfter(end) || cueNear(start, end, TEMPERATURE_CUES));
        }
        return true;
    }

    /** A plain "mm" value is a water column with a cue from 500 mm, or without one from 5000 mm unless a length cue is near (decision 062). */
    private boolean waterColumn(QuantityValue v, int start, int end) {
        if (v.compareTo(WATER_CUE_MIN) < 0) {
            return false;
        }
        if (cueNear(start, end, WATER_CUES)) {
            return true;
        }
        return v.compareTo(WATER_BARE_MIN) >= 0 && !cueNear(start, end, LENGTH_CUES);
    }

    private static boolean needsInteger(UnitDef def) {
        return def == UnitTable.PERSON || def == UnitTable.SEASON || def == UnitTable.FILL_POWER;
    }

    private static boolean fillPower(QuantityValue v) {
        return v.compareTo(100) >= 0 && v.compareTo(1200) <= 0;
    }

    /** 15 F / -9 C: a bare C right after another temperature, across only "/", "(", "," or spaces. */
    private boolean dualBefore(int start) {
        if (lastTemperatureEnd < 0 || start - lastTemperatureEnd > 4) {
            return false;
        }
        for (int k = lastTemperatureEnd; k < start; k++) {
            char c = at(k);
            if (!(isSpace(c) || c == '/' || c == '(' || c == ',' || c == '|' || c == '=')) {
                return false;
            }
        }
        return true;
    }

    /** 15 F / -9 C: a bare F right before another temperature. */
    private boolean dualAfter(int end) {
        int q = skipSpaces(end, 2);
        if (at(q) != '/' && at(q) != '(') {
            return false;
        }
        q = skipSpaces(q + 1, 2);
        if (at(q) == '-' || at(q) == '\u2212') {
            q++;
        }
        if (!isDigit(at(q))) {
            return false;
        }
        int saved = resume;
        Num n = number(q);
        resume = saved;
        if (n == null) {
            return false;
        }
        Hit h = unitAfter(n.end, n);
        return h != null && h.def.dimension() == Dimension.TEMPERATURE;
    }

    private void emit(UnitDef def, int start, int end, QuantityValue lo, QuantityValue hi) {
        int a = approxBefore(start);
        int s = a >= 0 ? a : start;
        double si = def.toBaseDouble(lo);
        double siMax = lo == hi ? si : def.toBaseDouble(hi);
        out.add(new Quantity(lo.toDouble(), def.dimension(), def.symbol(), si, s, end,
                text.subSequence(s, end).toString(), lo == hi ? lo.toDouble() : hi.toDouble(), siMax, a >= 0));
        if (def.dimension() == Dimension.TEMPERATURE) {
            lastTemperatureEnd = end;
        }
    }

    // ---------------------------------------------------------------- look-behind

    /** The offset of a minus sign right before {@code start} ("-9 °C", "−9 °C"), or -1. */
    private int signBefore(int start) {
        if (start < 1) {
            return -1;
        }
        char c = at(start - 1);
        if (c != '-' && c != '\u2212') {
            return -1;
        }
        return start < 2 || !Character.isLetterOrDigit(at(start - 2)) ? start - 1 : -1;
    }

    /** The offset of "~", "≈", "approx.", "ca.", "about" ... right before {@code start}, or -1. */
    private int approxBefore(int start) {
        int p = start - 1;
        while (p >= 0 && start - p <= 2 && isSpace(at(p))) {
            p--;
        }
        if (p < 0 || p < start - 3) {
            return -1;
        }
        char c = at(p);
        if (c == '~' || c == '\u2248') {
            return p;
        }
        if (p == start - 1) {
            return -1;   // a word needs a space before the number
        }
        boolean dotted = c == '.';
        int e = dotted ? p : p + 1;
        int b = e;
        while (b > 0 && e - b < 14 && isAsciiLetter(at(b - 1))) {
            b--;
        }
        if (b == e || (b > 0 && Character.isLetterOrDigit(at(b - 1)))) {
            return -1;
        }
        int wl = e - b;
        if (dotted && wl == 2 && regionIs(b, "ca")) {
            return b;
        }
        for (String a : APPROX_WORDS) {
            if (a.length() == wl && regionIs(b, a)) {
                return b;
            }
        }
        return -1;
    }

    /**
     * True when the number at {@code numStart} sits inside a quotation opened by {@code mark} on the same line
     * ("Ridge 2" is a name, not 2 inches). Apostrophes inside words (Fernhollow's) do not open a quotation.
     */
    private boolean insideQuotation(int numStart, char mark) {
        for (int k = numStart - 1; k >= 0 && numStart - k <= 80; k--) {
            char c = at(k);
            if (c == '\n' || c == '\r') {
                return false;
            }
            boolean isMark = c == mark || (mark == '"' && c == '\u201C') || (mark == '\'' && c == '\u2018');
            if (!isMark) {
                continue;
            }
            char before = k > 0 ? at(k - 1) : ' ';
            char after = at(k + 1);
            if (Character.isLetter(before) && Character.isLetter(after)) {
                continue;   // an apostrophe inside a word
            }
            if (isDigit(before)) {
                return false;   // 7" x 4": the earlier mark is a unit too
            }
            return !Character.isLetterOrDigit(before);   // opening mark; after a letter it closed a quotation
        }
        return false;
    }

    /** True when one of the cue words occurs near [start, end) on the same line, or in the context (a spec key). */
    private boolean cueNear(int start, int end, String[] cues) {
        int from = Math.max(0, start - 48);
        int to = Math.min(len, end + 32);
        for (int k = start - 1; k >= from; k--) {
            if (at(k) == '\n') {
                from = k + 1;
                break;
            }
        }
        for (int k = end; k < to; k++) {
            if (at(k) == '\n') {
                to = k;
                break;
            }
        }
        for (int k = from; k < to; k++) {
            char c = at(k);
            if (c >= 'A' && c <= 'Z') {
                c = (char) (c + 32);
            }
            for (String cue : cues) {
                if (cue.charAt(0) == c && k + cue.length() <= to && regionIs(k, cue)) {
                    return true;
                }
            }
        }
        for (String cue : cues) {
            if (context.contains(cue)) {
                return true;
            }
        }
        if (cues == WATER_CUES) {
            return hasWord(from, to, "HH") || contextRaw.contains("HH");
        }
        return false;
    }

    private boolean hasWord(int from, int to, String word) {
        for (int k = from; k + word.length() <= to; k++) {
            boolean same = true;
            for (int j = 0; j < word.length() && same; j++) {
                same = at(k + j) == word.charAt(j);
            }
            if (same && (k == 0 || !Character.isLetterOrDigit(at(k - 1))) && !Character.isLetterOrDigit(at(k + word.length()))) {
                return true;
            }
        }
        return false;
    }

    // ---------------------------------------------------------------- chars

    private char at(int p) {
        return p >= 0 && p < len ? text.charAt(p) : NONE;
    }

    /** Case-insensitive ASCII comparison of the text at p with a lower-case literal. */
    private boolean regionIs(int p, String lower) {
        if (p < 0 || p + lower.length() > len) {
            return false;
        }
        for (int j = 0; j < lower.length(); j++) {
            char c = text.charAt(p + j);
            if (c >= 'A' && c <= 'Z') {
                c = (char) (c + 32);
            }
            if (c != lower.charAt(j)) {
                return false;
            }
        }
        return true;
    }

    private boolean boundary(int e) {
        char c = at(e);
        return c == NONE || !(Character.isLetterOrDigit(c) || c == '\u00B2' || c == '\u00B3');
    }

    private int skipSpaces(int p, int max) {
        int q = p;
        while (q - p < max && isSpace(at(q))) {
            q++;
        }
        return q;
    }

    private int asciiWordEnd(int p) {
        int q = p;
        while (q < len && isAsciiLetter(text.charAt(q))) {
            q++;
        }
        return q;
    }

    private int numberRunEnd(int p) {
        int q = p;
        while (q < len && (isDigit(text.charAt(q)) || ((text.charAt(q) == '.' || text.charAt(q) == ',') && isDigit(at(q + 1))))) {
            q++;
        }
        return Math.max(q, p + 1);
    }

    private int alnumEnd(int p) {
        int q = p;
        while (q < len && Character.isLetterOrDigit(text.charAt(q))) {
            q++;
        }
        return Math.max(q, p + 1);
    }

    /** Lower-cases ASCII letters without a locale (Turkish I stays i). */
    private String lowerAscii(int from, int to) {
        char[] cs = new char[to - from];
        for (int k = 0; k < cs.length; k++) {
            char c = text.charAt(from + k);
            cs[k] = c >= 'A' && c <= 'Z' ? (char) (c + 32) : c;
        }
        return new String(cs);
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static boolean isAsciiLetter(char c) {
        return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
    }

    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\u00A0' || c == '\u2009' || c == '\u202F' || c == '\u2007';
    }

    /** Thin space, narrow no-break space, no-break space, figure space: thousands separators (1 200). */
    private static boolean isGroupSpace(char c) {
        return c == '\u2009' || c == '\u202F' || c == '\u00A0' || c == '\u2007';
    }

    private static final QuantityValue[] VULGAR = new QuantityValue[0x215F - 0x2150];
    private static final QuantityValue QUARTER = QuantityValue.of(1, 4);
    private static final QuantityValue HALF = QuantityValue.of(1, 2);
    private static final QuantityValue THREE_QUARTERS = QuantityValue.of(3, 4);

    static {
        int[][] f = {{1, 7}, {1, 9}, {1, 10}, {1, 3}, {2, 3}, {1, 5}, {2, 5}, {3, 5}, {4, 5}, {1, 6}, {5, 6}, {1, 8}, {3, 8}, {5, 8}, {7, 8}};
        for (int k = 0; k < f.length; k++) {
            VULGAR[k] = QuantityValue.of(f[k][0], f[k][1]);
        }
    }

    /** ¼ ½ ¾ and U+2150..U+215E (⅐ … ⅞) as exact fractions; null for anything else. */
    private static QuantityValue vulgar(char c) {
        switch (c) {
            case '\u00BC': return QUARTER;
            case '\u00BD': return HALF;
            case '\u00BE': return THREE_QUARTERS;
            default:
                return c >= '\u2150' && c <= '\u215E' ? VULGAR[c - 0x2150] : null;
        }
    }
}
