package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The cluster record refuses inconsistent counts and empty names. */
class SpecKeyClusterTest {
    private static final SpecKeyCluster.Member WEIGHT = new SpecKeyCluster.Member("Weight", "weight", 3);
    private static final SpecKeyCluster.Member WT = new SpecKeyCluster.Member("Wt.", "weight", 2);

    @Test
    void theCountIsTheSumOfTheMembers() {
        assertEquals(5, new SpecKeyCluster("weight", List.of(WEIGHT, WT), 5, Optional.empty()).count());
        assertThrows(IllegalArgumentException.class, () -> new SpecKeyCluster("weight", List.of(WEIGHT, WT), 6, Optional.empty()));
    }

    @Test
    void aClusterNeedsANameAndMembers() {
        assertThrows(IllegalArgumentException.class, () -> new SpecKeyCluster(" ", List.of(WEIGHT), 3, Optional.empty()));
        assertThrows(IllegalArgumentException.class, () -> new SpecKeyCluster("weight", List.of(), 0, Optional.empty()));
    }

    @Test
    void aMemberWasSeenAtLeastOnce() {
        assertThrows(IllegalArgumentException.class, () -> new SpecKeyCluster.Member("Weight", "weight", 0));
    }

    @Test
    void membersAreCopied() {
        List<SpecKeyCluster.Member> list = new ArrayList<>(List.of(WEIGHT));
        SpecKeyCluster c = new SpecKeyCluster("weight", list, 3, Optional.empty());
        list.add(WT);
        assertEquals(1, c.members().size());
    }
}
