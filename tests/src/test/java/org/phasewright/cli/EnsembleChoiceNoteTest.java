package org.phasewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.ensemble.PointTask;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;

/**
 * A command line without Spark next to it says so only when an ensemble runs, once (common practice for such
 * notes, no source): runs without orbit diagrams, Lyapunov maps or basins print nothing extra.
 */
class EnsembleChoiceNoteTest {
    private static final String NOTE = "Spark is not next to phasewright.jar";

    /** Squares of the point numbers: an ensemble that needs no model. */
    private static final class Squares implements PointTask<Integer> {
        @Override
        public int points() {
            return 5;
        }

        @Override
        public Integer compute(CompiledModel model, int point, long deadlineNanos, BooleanSupplier cancelled) {
            return point * point;
        }

        @Override
        public void checkModel(CompiledModel model) {
        }
    }

    /** dx/dt = -x: the model the executors are handed (the task ignores it). */
    private static CompiledModel decay() {
        ModelAssembler a = new ModelAssembler("decay", null, new TimeAxis("t", null));
        Variable x = a.state("x", new Constant(1), null, null);
        a.rate(x, new Negation(x));
        return ModelCompiler.compile(a.build(List.of(), List.of()));
    }

    @Test
    void withoutSparkTheNoteComesWithTheFirstEnsembleOnly() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream err = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        PhaseSourceRecipe recipe = new PhaseSourceRecipe("m.phase", "model m \"m\"\nstate x = 1\nrate x = -x\n");
        try (EnsembleChoice choice = EnsembleChoice.of(null, false, recipe, err, false)) {
            assertEquals("", bytes.toString(StandardCharsets.UTF_8), "nothing before an ensemble runs");
            var rows = choice.executor().run(new Squares(), decay(), EnsembleControl.NONE);
            assertEquals(16, (int) rows.rows().get(4));
            choice.executor().run(new Squares(), decay(), EnsembleControl.NONE);
        }
        String said = bytes.toString(StandardCharsets.UTF_8);
        assertTrue(said.contains(NOTE), said);
        assertEquals(said.indexOf(NOTE), said.lastIndexOf(NOTE), "said once");
    }

    @Test
    void noSparkAsksForLocalThreadsWithoutANote() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream err = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        PhaseSourceRecipe recipe = new PhaseSourceRecipe("m.phase", "model m \"m\"\n");
        try (EnsembleChoice choice = EnsembleChoice.of(null, true, recipe, err, false)) {
            choice.executor().run(new Squares(), decay(), EnsembleControl.NONE);
        }
        assertEquals("", bytes.toString(StandardCharsets.UTF_8));
    }
}
