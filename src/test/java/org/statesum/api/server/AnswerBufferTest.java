package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.ProblemException;

class AnswerBufferTest {

    private static ComputeGate gate(long budget) {
        return new ComputeGate(OperationsConfig.defaults().withMemoryBudget(budget), new ServiceMetrics());
    }

    @Test
    void theBytesComeBackInOrderAcrossBlocks() throws IOException {
        byte[] data = new byte[3_000_000];
        new Random(7).nextBytes(data);
        AnswerBuffer buffer = new AnswerBuffer(null);
        buffer.write(data[0]);
        buffer.write(data, 1, 99_999);
        buffer.write(data, 100_000, data.length - 100_000);
        assertEquals(data.length, buffer.size());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        buffer.writeTo(out);
        assertArrayEquals(data, out.toByteArray());
    }

    @Test
    void anAnswerReservesItsBlocksAndOneLargerThanTheBudgetIs422() {
        ComputeGate gate = gate(4 << 20);
        try (MemoryBudget.Share memory = gate.memory()) {
            AnswerBuffer buffer = new AnswerBuffer(memory);
            buffer.write(new byte[3 << 20], 0, 3 << 20); // 3 MiB in blocks of up to 1 MiB: fits in 4 MiB
            MemoryBudget.Share other = gate.memory();
            assertThrows(OverloadedException.class, () -> other.cover(2 << 20, 1)); // the rest is too small: 503
            other.close();
        }
        try (MemoryBudget.Share memory = gate.memory()) {
            AnswerBuffer buffer = new AnswerBuffer(memory);
            ProblemException tooLarge = assertThrows(ProblemException.class,
                    () -> buffer.write(new byte[5 << 20], 0, 5 << 20));
            assertEquals(422, tooLarge.problem().status());
            assertEquals("https://statesum.org/problems/answer-too-large", tooLarge.problem().type());
        }
        try (MemoryBudget.Share all = gate.memory()) {
            all.cover(4 << 20, 1); // everything was given back
        }
    }
}
