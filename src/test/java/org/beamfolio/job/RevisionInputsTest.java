package org.beamfolio.job;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.beamfolio.model.InputChange;
import org.junit.jupiter.api.Test;

/** The revision sheet's inputs: loads matched by case, type and place, not by their place in the list. */
class RevisionInputsTest {
    static final String BEFORE = """
            beamfolio: 1
            loads:
              - { case: D, type: uniform, w: 300 lb/ft }
              - { case: L, type: point, P: 2 kip, at: 9 ft }
            """;

    @Test
    void anInsertedLoadIsOneNewLoadNotEveryLaterOneChanged() {
        String now = """
                beamfolio: 1
                loads:
                  - { case: S, type: uniform, w: 150 lb/ft, from: 0 ft, to: 12 ft }
                  - { case: D, type: uniform, w: 300 lb/ft }
                  - { case: L, type: point, P: 2 kip, at: 9 ft }
                """;
        List<InputChange> changes = RevisionInputs.between(BEFORE, now);
        assertEquals(List.of("loads[S uniform 0 ft to 12 ft].case", "loads[S uniform 0 ft to 12 ft].type",
                "loads[S uniform 0 ft to 12 ft].w", "loads[S uniform 0 ft to 12 ft].from", "loads[S uniform 0 ft to 12 ft].to"),
                changes.stream().map(InputChange::key).toList());
    }

    @Test
    void aChangedValueIsNamedByTheLoadItBelongsTo() {
        List<InputChange> changes = RevisionInputs.between(BEFORE, BEFORE.replace("P: 2 kip", "P: 3 kip"));
        assertEquals(List.of(new InputChange("loads[L point at 9 ft].P", "2 kip", "3 kip")), changes);
    }
}
