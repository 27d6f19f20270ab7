package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FeedbackCsvTest {
    private static final String HEADER = "pair_id,reference_id,target_id,annotator,sentence\n";

    @TempDir
    Path dir;

    private static FeedbackSentences read(String text) throws IOException {
        return FeedbackCsv.read(new StringReader(text), FeedbackColumns.DEFAULT, "feedback.csv");
    }

    @Test
    void readsTheDefaultColumnsWithQuotedSentences() throws IOException {
        FeedbackSentences f = read(HEADER + "P1,R1,T1,alder,\"Lighter, and with a hood\"\nP1,R1,T1,birch,Heavier\n");
        assertEquals(2, f.sentences().size());
        FeedbackSentence s = f.sentences().get(0);
        assertEquals("P1", s.pairId());
        assertEquals("R1", s.referenceId());
        assertEquals("T1", s.targetId());
        assertEquals("Lighter, and with a hood", s.text());
        assertEquals(2, s.row());
        assertTrue(f.problems().isEmpty());
        assertEquals(2, f.rowsRead());
    }

    @Test
    void columnsAreFoundByNameInAnyOrderIgnoringCaseAndExtras() throws IOException {
        FeedbackSentences f = read("Sentence,extra,ANNOTATOR,target_id,reference_id,pair_id\nRoomier,x,alder,T1,R1,P1\n");
        assertEquals("Roomier", f.sentences().get(0).text());
        assertEquals("T1", f.sentences().get(0).targetId());
    }

    @Test
    void otherColumnNamesAreConfigurable() throws IOException {
        FeedbackColumns c = new FeedbackColumns("comparison", "ref", "sku", "who", "text");
        FeedbackSentences f = FeedbackCsv.read(new StringReader("comparison,ref,sku,who,text\nC1,A,B,w,Lighter\n"), c, "x.csv");
        assertEquals(1, f.sentences().size());
        assertThrows(IllegalArgumentException.class, () -> new FeedbackColumns("a", "A ", "b", "c", "d"));
    }

    @Test
    void aMissingColumnIsOneHeaderProblemNamingWhatWasFound() throws IOException {
        FeedbackSentences f = read("pair_id,reference_id,target_id,sentence\nP1,R1,T1,Lighter\n");
        assertTrue(f.sentences().isEmpty());
        assertEquals(1, f.problems().size());
        FeedbackProblem p = f.problems().get(0);
        assertEquals("header", p.kind());
        assertEquals(1, p.row());
        assertTrue(p.reason().contains("[annotator]") && p.reason().contains("found"), p.reason());
    }

    @Test
    void badRowsArePositionedProblemsAndTheRestIsRead() throws IOException {
        FeedbackSentences f = read(HEADER
                + "P1,R1,T1,alder,Lighter\n"          // row 2 ok
                + "P1,R1,T1,,Heavier\n"               // row 3 empty annotator
                + "P1,R1\n"                            // row 4 short
                + "P1,R1,T2,birch,Roomier\n"          // row 5 pair conflict
                + "P2,R1,R1,birch,Warmer\n"           // row 6 same listing
                + "P1,R1,T1,alder,Lighter\n"          // row 7 repeated
                + "\n"                                 // row 8 blank: silent
                + "P3,R2,T2,cedar,Bulkier\n");        // row 9 ok
        assertEquals(List.of(2L, 9L), f.sentences().stream().map(FeedbackSentence::row).toList());
        assertEquals(List.of("empty-field", "missing-column", "pair-conflict", "same-listing", "repeated"),
                f.problems().stream().map(FeedbackProblem::kind).toList());
        assertEquals(List.of(3L, 4L, 5L, 6L, 7L), f.problems().stream().map(FeedbackProblem::row).toList());
        assertEquals(7, f.rowsRead());
        for (FeedbackProblem p : f.problems()) {
            assertFalse(p.reason().contains("alder") || p.reason().contains("birch"), "a reason names a person: " + p.reason());
        }
    }

    @Test
    void brokenQuotingStopsReadingWithAProblemAfterTheGoodRows() throws IOException {
        FeedbackSentences f = read(HEADER + "P1,R1,T1,alder,Lighter\nP1,R1,T1,birch,\"never closed\n");
        assertEquals(1, f.sentences().size());
        assertEquals("parse", f.problems().get(f.problems().size() - 1).kind());
    }

    @Test
    void anEmptyFileIsAProblemNotAnError() throws IOException {
        FeedbackSentences f = read("");
        assertEquals("header", f.problems().get(0).kind());
        assertEquals(0, f.problems().get(0).row());
    }

    @Test
    void bytesThatAreNotUtf8AreAnEncodingProblemAndABomIsSkipped() throws IOException {
        Path file = dir.resolve("feedback.csv");
        byte[] head = ("\uFEFF" + HEADER + "P1,R1,T1,alder,Lighter\nP1,R1,T1,birch,").getBytes(StandardCharsets.UTF_8);
        byte[] bad = {(byte) 0xE9, 'x', '\n'};
        byte[] all = new byte[head.length + bad.length];
        System.arraycopy(head, 0, all, 0, head.length);
        System.arraycopy(bad, 0, all, head.length, bad.length);
        Files.write(file, all);
        FeedbackSentences f = FeedbackCsv.read(file, FeedbackColumns.DEFAULT, "feedback.csv");
        assertEquals(1, f.sentences().size());
        assertEquals("encoding", f.problems().get(0).kind());
        assertEquals(3, f.problems().get(0).row());
    }

    @Test
    void aMissingFileIsAnIoException() {
        assertThrows(IOException.class, () -> FeedbackCsv.read(dir.resolve("nope.csv"), FeedbackColumns.DEFAULT));
    }
}
