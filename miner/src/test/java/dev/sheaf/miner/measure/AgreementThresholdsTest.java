package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

class AgreementThresholdsTest {
    private final AgreementThresholds t = AgreementThresholds.DEFAULTS;

    @Test
    void kappaBandsFollowLandisAndKoch() {
        // Landis & Koch 1977, Biometrics 33(1) [pub]: <0 poor, .00–.20 slight, .21–.40 fair, .41–.60 moderate,
        // .61–.80 substantial, .81–1 almost perfect
        assertEquals(KappaBand.POOR, t.band(-0.01));
        assertEquals(KappaBand.SLIGHT, t.band(0.0));
        assertEquals(KappaBand.SLIGHT, t.band(0.20));
        assertEquals(KappaBand.FAIR, t.band(0.21));
        assertEquals(KappaBand.FAIR, t.band(0.40));
        assertEquals(KappaBand.MODERATE, t.band(0.41));
        assertEquals(KappaBand.MODERATE, t.band(0.60));
        assertEquals(KappaBand.SUBSTANTIAL, t.band(0.61));
        assertEquals(KappaBand.SUBSTANTIAL, t.band(0.80));
        assertEquals(KappaBand.ALMOST_PERFECT, t.band(0.81));
        assertEquals(KappaBand.ALMOST_PERFECT, t.band(1.0));
        assertEquals(KappaBand.UNDEFINED, t.band(Double.NaN));
    }

    @Test
    void theGapBetweenPrintedBandsBelongsToTheHigherBand() {
        assertEquals(KappaBand.FAIR, t.band(0.205));
        assertEquals(KappaBand.ALMOST_PERFECT, t.band(0.805));
    }

    @Test
    void alphaVerdictsFollowKrippendorff() {
        // Krippendorff 2004, Content Analysis 2nd ed. [mem]: ≥ .800 reliable; .667–.800 tentative; below: contested
        assertEquals(AgreementVerdict.RELIABLE, t.verdict(0.800));
        assertEquals(AgreementVerdict.TENTATIVE, t.verdict(0.7999));
        assertEquals(AgreementVerdict.TENTATIVE, t.verdict(0.667));
        assertEquals(AgreementVerdict.CONTESTED, t.verdict(0.6669));
        assertEquals(AgreementVerdict.CONTESTED, t.verdict(-0.3));
        assertEquals(AgreementVerdict.UNDEFINED, t.verdict(Double.NaN));
    }

    @Test
    void edgesCanBeOverriddenByKey() {
        AgreementThresholds strict = AgreementThresholds.fromMap(Map.of("alpha.reliable", 0.9, "kappa.fair", 0.5));
        assertEquals(AgreementVerdict.TENTATIVE, strict.verdict(0.85));
        assertEquals(KappaBand.FAIR, strict.band(0.45));
        assertEquals(0.9, strict.asMap().get("alpha.reliable"));
        assertEquals(0.667, strict.alphaTentative());
    }

    @Test
    void anUnknownKeyIsRejectedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> AgreementThresholds.fromMap(Map.of("alpha.good", 0.9)));
        assertTrue(e.getMessage().contains("alpha.good"), e.getMessage());
    }

    @Test
    void edgesMustBeInOrder() {
        assertThrows(IllegalArgumentException.class, () -> t.with("alpha.tentative", 0.9));
        assertThrows(IllegalArgumentException.class, () -> t.with("kappa.moderate", 0.3));
        assertThrows(IllegalArgumentException.class, () -> t.with("kappa.slight", Double.NaN));
    }
}
