package org.phasewright.runtime.compile;

import java.util.List;

import org.phasewright.runtime.model.DynamicalModel;

/**
 * A model ready for numerics: its vector field (generated or interpreted), the resolved parameter values and the
 * initial state, and the names used for output. Arrays are copied in and out, so instances are immutable.
 */
public final class CompiledModel {
    /** How the vector field is evaluated. */
    public enum Backend { GENERATED_CODE, INTERPRETER }

    private final DynamicalModel model;
    private final VectorField field;
    private final DerivedValues derivedValues;
    private final double[] parameters;
    private final double[] initialState;
    private final boolean autonomous;
    private final Backend backend;
    private final String note;
    private final String generatedSource;
    private final java.util.function.Supplier<LatticeRates> latticeCompiler; // null when there can be none
    private volatile boolean latticeMade;
    private volatile LatticeRates lattice;

    CompiledModel(DynamicalModel model, VectorField field, DerivedValues derivedValues, double[] parameters,
            double[] initialState, boolean autonomous, Backend backend, String note, String generatedSource) {
        this(model, field, derivedValues, parameters, initialState, autonomous, backend, note, generatedSource, null);
    }

    CompiledModel(DynamicalModel model, VectorField field, DerivedValues derivedValues, double[] parameters,
            double[] initialState, boolean autonomous, Backend backend, String note, String generatedSource,
            java.util.function.Supplier<LatticeRates> latticeCompiler) {
        this.model = model;
        this.field = SparseJacobians.attach(model, field); // large or indexed models: sparse Jacobian too
        this.derivedValues = derivedValues;
        this.parameters = parameters.clone();
        this.initialState = initialState.clone();
        this.autonomous = autonomous;
        this.backend = backend;
        this.note = note;
        this.generatedSource = generatedSource;
        this.latticeCompiler = latticeCompiler;
    }

    /**
     * The rates on windows of cells when the model is a lattice (see {@link LatticeRates}), for integrators that
     * work tile by tile; null otherwise. Same values as {@link #field()}. Generated and compiled on the first call,
     * so models that never run tile by tile do not pay for it.
     */
    public LatticeRates lattice() {
        if (!latticeMade) {
            synchronized (this) {
                if (!latticeMade) {
                    lattice = latticeCompiler == null ? null : latticeCompiler.get();
                    latticeMade = true;
                }
            }
        }
        return lattice;
    }

    public DynamicalModel model() {
        return model;
    }

    public String name() {
        return model.name();
    }

    /** Generated instances are stateless and thread-safe; the interpreter is not thread-safe. */
    public VectorField field() {
        return field;
    }

    public DerivedValues derivedValues() {
        return derivedValues;
    }

    public int dimension() {
        return model.dimension();
    }

    public double[] parameters() {
        return parameters.clone();
    }

    public double[] initialState() {
        return initialState.clone();
    }

    /** False when the rates depend on time, which makes equilibria meaningless. */
    public boolean autonomous() {
        return autonomous;
    }

    public Backend backend() {
        return backend;
    }

    /** Why the interpreter is used, or null. */
    public String note() {
        return note;
    }

    /** The Java source that was compiled, or null for the interpreter. For inspection and debugging. */
    public String generatedSource() {
        return generatedSource;
    }

    public String timeName() {
        return model.time() == null ? "t" : model.time().name();
    }

    public List<String> stateNames() {
        return model.states().stream().map(s -> s.name()).toList();
    }

    public List<String> parameterNames() {
        return model.parameters().stream().map(p -> p.name()).toList();
    }

    public List<String> derivedNames() {
        return model.derived().stream().map(d -> d.name()).toList();
    }
}
