package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class JudgmentScaleTest {
    @Test
    void presentAbsentWordsMakeABinaryNominalScale() {
        JudgmentScale s = JudgmentScale.of(List.of("Yes", "no", "TRUE", "false", "present", "absent", "1", "0"), null, 10);
        assertEquals(JudgmentScale.Kind.BINARY, s.kind);
        assertEquals(AgreementMetric.NOMINAL, s.metric);
        assertEquals(s.categoryOf("yes"), s.categoryOf("1"));
        assertEquals(s.categoryOf("present"), s.categoryOf(" True "));
        assertEquals(s.categoryOf("no"), s.categoryOf("absent"));
        assertEquals(List.of("absent", "present"), s.labels);
    }

    @Test
    void smallIntegerScalesAreOrdinalGrades() {
        JudgmentScale s = JudgmentScale.of(List.of("1", "2", "3", "2.0", "5"), null, 10);
        assertEquals(JudgmentScale.Kind.GRADES, s.kind);
        assertEquals(AgreementMetric.ORDINAL, s.metric);
        assertFalse(s.metricFromOptions);
        assertEquals(List.of("1", "2", "3", "5"), s.labels);
        assertEquals(s.categoryOf("2"), s.categoryOf("2.0"));
    }

    @Test
    void fractionsOrManyLevelsAreIntervalNumbers() {
        assertEquals(AgreementMetric.INTERVAL, JudgmentScale.of(List.of("1.5", "2", "3"), null, 10).metric);
        assertEquals(AgreementMetric.INTERVAL, JudgmentScale.of(List.of("1", "2", "3", "4"), null, 3).metric);
    }

    @Test
    void otherValuesAreUnorderedCategoriesComparedIgnoringCaseAndSpacing() {
        JudgmentScale s = JudgmentScale.of(List.of("Two-way  zip", "two-way zip", "toggle", "yes"), null, 10);
        assertEquals(JudgmentScale.Kind.CATEGORIES, s.kind);
        assertEquals(AgreementMetric.NOMINAL, s.metric);
        assertEquals(3, s.size());
        assertEquals(s.categoryOf("TWO-WAY ZIP"), s.categoryOf("two-way zip"));
    }

    @Test
    void aMetricSetByOptionIsUsedWhenTheValuesAllowIt() {
        JudgmentScale s = JudgmentScale.of(List.of("1", "2", "3"), AgreementMetric.INTERVAL, 10);
        assertEquals(AgreementMetric.INTERVAL, s.metric);
        assertTrue(s.metricFromOptions);
        assertNull(s.note);
    }

    @Test
    void anOrderedMetricOnWordsFallsBackToNominalWithANote() {
        JudgmentScale s = JudgmentScale.of(List.of("slim", "regular"), AgreementMetric.ORDINAL, 10);
        assertEquals(AgreementMetric.NOMINAL, s.metric);
        assertTrue(s.note.contains("ordinal") && s.note.contains("not numbers"), s.note);
    }

    @Test
    void theRatioMetricOnNegativeNumbersFallsBackToInterval() {
        JudgmentScale s = JudgmentScale.of(List.of("-5", "0", "10"), AgreementMetric.RATIO, 10);
        assertEquals(AgreementMetric.INTERVAL, s.metric);
        assertTrue(s.note.contains("negative"), s.note);
    }

    @Test
    void thousandsSeparatorsAndUnitsAreNotNumbers() {
        assertEquals(JudgmentScale.Kind.CATEGORIES, JudgmentScale.of(List.of("1,5", "2"), null, 10).kind);
        assertEquals(JudgmentScale.Kind.CATEGORIES, JudgmentScale.of(List.of("2 kg", "3"), null, 10).kind);
    }
}
