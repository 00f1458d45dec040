package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class BracketedRootsTest {

    @Test
    void findsEveryBracketedRootOfTheCosineWithinTheTolerance() {
        double[] grid = new double[11];
        double[] values = new double[11];
        for (int j = 0; j <= 10; j++) {
            grid[j] = j;
            values[j] = Math.cos(j);
        }
        List<BracketedRoots.Root> roots = BracketedRoots.find(Math::cos, grid, values, 1e-10, 0);
        // cos has zeros at pi/2, 3 pi/2 and 5 pi/2 in [0, 10] (exact values).
        assertEquals(3, roots.size());
        for (int k = 0; k < 3; k++) {
            assertEquals((2 * k + 1) * Math.PI / 2, roots.get(k).x(), roots.get(k).tolerance());
            assertEquals(k % 2 == 1, roots.get(k).rising());
            assertTrue(roots.get(k).evaluations() > 0 && roots.get(k).evaluations() < BracketedRoots.MAX_EVALUATIONS);
        }
    }

    @Test
    void aGridPointAtZeroIsARootAndTinyFunctionValuesAreNotMistakenForZero() {
        double[] grid = {1, 2, 3};
        // Scaled like a reaction Gibbs energy per molecule in J (~1e-20): the root at 2 must be a grid
        // root, and the one of (x - 2.5) * 1e-20 found to the tolerance, not taken at the first trial point.
        assertEquals(2, BracketedRoots.find(x -> (x - 2) * 1e-20, grid, new double[] {-1e-20, 0, 1e-20}, 1e-9, 0)
                .get(0).x(), 0);
        BracketedRoots.Root r = BracketedRoots.find(x -> (x - 2.3) * 1e-20, new double[] {2, 3},
                new double[] {-0.3e-20, 0.7e-20}, 1e-9, 0).get(0);
        assertEquals(2.3, r.x(), 1e-9);
        assertTrue(r.rising());
        assertFalse(BracketedRoots.find(x -> 1, grid, new double[] {1, 1, 1}, 1e-9, 0).iterator().hasNext());
    }
}
