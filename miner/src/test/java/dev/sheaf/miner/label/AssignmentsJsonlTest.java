package dev.sheaf.miner.label;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Old assignment files stay readable after concepts are merged. */
class AssignmentsJsonlTest {
    @TempDir
    Path dir;

    private final Vocabulary vocab = LabelFixtures.vocabulary();

    private static String concept(String id, String polarity, int start) {
        return "{\"concept\":\"" + id + "\",\"facet\":\"material\",\"label\":\"x\",\"polarity\":\"" + polarity + "\","
                + "\"applies\":true,\"review\":false,\"evidence\":[{\"field\":0,\"fieldKind\":\"title\",\"key\":\"\","
                + "\"part\":\"text\",\"start\":" + start + ",\"end\":" + (start + 3) + ",\"text\":\"abc\",\"labelKind\":\"preferred\","
                + "\"polarity\":\"" + polarity + "\"" + (polarity.equals("negated") ? ",\"cue\":\"no\"" : "") + "}]}";
    }

    @Test
    void mergedConceptsResolveThroughReplacedByAndCollapseIntoOne() throws IOException {
        Path f = dir.resolve("assignments.jsonl");
        Files.writeString(f, "{\"id\":\"FH-1\",\"category\":\"jackets\",\"source\":\"s\",\"locator\":\"\",\"concepts\":["
                + concept("old-ripstop", "negated", 0) + "," + concept("ripstop-nylon", "stated", 10) + ","
                + concept("gone", "stated", 20) + "," + concept("never-was", "stated", 30) + "],\"invalid\":[]}\n"
                + "not json\n"
                + "{\"id\":\"FH-2\",\"category\":\"jackets\",\"source\":\"s\",\"locator\":\"\",\"concepts\":["
                + concept("rip-stop", "stated", 0) + "]}\n", StandardCharsets.UTF_8);
        List<Assignments> got = new ArrayList<>();
        AssignmentsJsonl.ReadSummary s = AssignmentsJsonl.read(f, vocab, got::add);
        assertEquals(3, s.lines());
        assertEquals(2, s.listings());
        assertEquals(2, s.resolved(), "old-ripstop (two steps: old-ripstop → rip-stop → ripstop-nylon) and rip-stop");
        Assignment one = got.get(0).assignments().get(0);
        assertEquals(1, got.get(0).assignments().size());
        assertEquals("ripstop-nylon", one.conceptId());
        assertEquals(Polarity.STATED, one.polarity(), "stated wins when a merged concept was negated in one place and stated in another");
        assertEquals(2, one.evidence().size());
        assertEquals("ripstop-nylon", got.get(1).assignments().get(0).conceptId());
        assertEquals(3, s.problems().size(), s.problems().toString());
        assertTrue(s.problems().get(0).contains("line 2"));
        assertTrue(s.problems().stream().anyMatch(p -> p.contains("\"gone\"")));
        assertTrue(s.problems().stream().anyMatch(p -> p.contains("\"never-was\"")));
    }
}
