package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.statesum.api.config.OperationsConfig;

/** The body memory budget: reserved as bodies grow, refused past its end, returned when a request ends. */
class ComputeGateTest {

    private static final long BUDGET = 1 << 20; // 1 MiB

    private static ComputeGate gate() {
        return new ComputeGate(OperationsConfig.defaults().withConcurrency(2, 8, 0).withMemoryBudget(BUDGET),
                new ServiceMetrics());
    }

    @Test
    void bodiesShareTheBudgetAndGiveItBackWhenTheirRequestEnds() {
        ComputeGate gate = gate();
        ComputeGate.Ticket first = gate.admit();
        first.reserveBody(64 * 1024, 8); // 512 KiB of the 1 MiB
        ComputeGate.Ticket second = gate.admit();
        second.reserveBody(64 * 1024, 8); // the other 512 KiB
        ComputeGate.Ticket third = gate.admit();
        OverloadedException refused = assertThrows(OverloadedException.class, () -> third.reserveBody(1, 1));
        assertEquals(503, refused.problem().status());
        assertTrue(refused.problem().detail().contains("STATESUM_MEMORY_BUDGET_BYTES"), refused.problem().detail());
        first.close();
        third.reserveBody(100 * 1024, 4); // 400 KiB fit in what the first gave back
        second.close();
        third.close();
        try (MemoryBudget.Share whole = gate.memory()) {
            whole.cover(BUDGET, 1); // the whole budget is free again
        }
    }

    @Test
    void aGrowingBodyReservesOnlyTheDifferenceAndABodyBeyondTheBudgetTakesThreeQuartersOfIt() {
        ComputeGate gate = gate();
        ComputeGate.Ticket growing = gate.admit();
        for (long bytes = 0; bytes <= 80 * 1024; bytes += 1024) {
            growing.reserveBody(bytes, 8); // 640 KiB at the end, reserved step by step
        }
        ComputeGate.Ticket other = gate.admit();
        other.reserveBody(384 * 1024, 1); // exactly the 384 KiB left
        assertThrows(OverloadedException.class, () -> other.reserveBody(384 * 1024 + 1, 1));
        other.close();
        growing.close();
        ComputeGate.Ticket huge = gate.admit();
        huge.reserveBody(64L << 20, 8); // 512 MiB wanted: capped at three quarters of the budget, not refused
        try (MemoryBudget.Share answer = gate.memory()) {
            answer.coverAnswer(256 * 1024); // the last quarter stays free for its answer
            assertThrows(OverloadedException.class, () -> gate.admit().reserveBody(1, 1));
        }
        huge.releaseBody(); // once computed, the body's share is free again
        gate.admit().reserveBody(700 * 1024, 1);
    }
}
