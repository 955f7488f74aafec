package org.shapetrail.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.reliability.KillTarget.Operation;

/**
 * The quick subset of the kill runs (bench/kill-runs.sh runs 100): two SIGKILLs at random moments of each
 * writing operation; every file left is sound, holds only whole visits and is exactly before or after.
 */
class KillRunsTest {
    @TempDir
    Path dir;

    @Test
    void aWriterKilledAtARandomMomentLeavesTheFileBeforeOrAfterNeverBetween() throws Exception {
        KillRuns k = new KillRuns(dir, 7);
        for (int round = 0; round < 2; round++) {
            for (Operation op : Operation.values()) {
                KillRuns.Outcome o = k.run(op);
                assertTrue(o.intact(), o.toString());
            }
        }
    }
}
