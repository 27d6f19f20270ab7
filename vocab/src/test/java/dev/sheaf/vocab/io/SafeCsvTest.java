package dev.sheaf.vocab.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class SafeCsvTest {

    private static String write(Object... cells) throws Exception {
        StringWriter w = new StringWriter();
        new SafeCsv(w).row(cells);
        return w.toString();
    }

    @Test
    void neutralisesTheOwaspExample() throws Exception {
        // OWASP "CSV Injection" page, example payload =1+2";=1+2 -> "'=1+2"";=1+2" [pub]
        assertEquals("\"'=1+2\"\";=1+2\"\r\n", write("=1+2\";=1+2"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"=", "+", "-", "@", "\t", "\r", "\n", "\0"})
    void quotesAndPrefixesEveryDangerousLeadingCharacter(String lead) throws Exception {
        // OWASP ASVS 5.0 requirement 1.2.10 lists these leading characters [pub]
        String out = write(lead + "cmd|' /C calc'!A0");
        assertEquals("\"'" + lead, out.substring(0, 2 + lead.length()));
    }

    @Test
    void leavesOrdinaryTextAndNumbersAlone() throws Exception {
        assertEquals("ripstop nylon,-1.5,3,\"a, b\"\r\n", write("ripstop nylon", -1.5, 3, "a, b"));
    }

    @Test
    void doublesQuotesPerRfc4180() throws Exception {
        // RFC 4180 §2.7: a double quote inside a quoted field is escaped by another double quote [pub]
        assertEquals("\"say \"\"hi\"\"\"\r\n", write("say \"hi\""));
    }

    @ParameterizedTest
    @ValueSource(strings = {"=1+2\";=1+2", "-20 °C rated", "+loft", "@home", "\tindent", "'=already", "''", "'",
            "'90s style", "plain", "", "'-", "a|b"})
    void restoreUndoesNeutraliseForEveryString(String s) {
        assertEquals(s, SafeCsv.restore(SafeCsv.neutralise(s)));
    }

    @Test
    void aCellAlreadyStartingWithAQuoteBeforeAFormulaIsQuotedAgain() throws Exception {
        // without the extra quote, "'=x" would read back as "=x"
        assertEquals("\"''=x\"\r\n", write("'=x"));
        assertEquals("'90s\r\n", write("'90s"));
    }

    @Test
    void integerTailIsWrittenAsTheNumberCellsWouldBe() throws Exception {
        // the fast path for wide numeric tables must give the same bytes as boxed Number cells
        Object[] head = {"=id", "tent, 2p", "src"};
        int[] numbers = {1, 0, -1, 12, -30, Integer.MIN_VALUE};
        StringWriter fast = new StringWriter();
        new SafeCsv(fast).row(head, numbers);
        assertEquals(write("=id", "tent, 2p", "src", 1, 0, -1, 12, -30, Integer.MIN_VALUE), fast.toString());
        assertEquals("\"'=id\",\"tent, 2p\",src,1,0,-1,12,-30,-2147483648\r\n", fast.toString());
    }

    @Test
    void integerTailWithoutTextCellsHasNoLeadingDelimiter() throws Exception {
        StringWriter w = new StringWriter();
        new SafeCsv(w).row(new Object[0], new int[] {0, 1});
        assertEquals("0,1\r\n", w.toString());
    }
}
