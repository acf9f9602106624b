package org.phasewright.runtime.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.continuation.Branch;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.ContinuationPoint;
import org.phasewright.runtime.equilibria.Classification;

/** branches.csv for points that could not be classified (our own output rules). */
class BranchesCsvTest {

    @Test
    void anUnclassifiedPointHasNoUnstableDimensionAndIsNotCalledStable() {
        ContinuationPoint known = new ContinuationPoint(1, new double[] {0.5}, new double[] {-1}, new double[] {0},
                new Classification("stable node", 1, 0, 0), null);
        ContinuationPoint unknown = new ContinuationPoint(2, new double[] {0.7}, new double[0], new double[0],
                new Classification("not classified: the rightmost of its 1 eigenvalues did not converge", 0, 0, 0),
                null);
        ContinuationOutcome o = new ContinuationOutcome("p", 1, 2, ContinuationOutcome.Ending.COMPLETED,
                List.of(new Branch(1, "start", List.of(known, unknown), "reached p = 2")), List.of(), 2, Double.NaN, 0);
        String[] rows = BranchesCsv.render(List.of("x"), o).split("\r?\n");
        assertEquals("branch,point,p,x,stable,unstable_dimension,type,special", rows[0]);
        assertTrue(rows[1].startsWith("1,1,1.0,0.5,true,0,stable node,"), rows[1]);
        assertTrue(rows[2].startsWith("1,2,2.0,0.7,false,,"), rows[2]);
    }
}
