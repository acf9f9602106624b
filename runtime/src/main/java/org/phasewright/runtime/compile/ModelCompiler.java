package org.phasewright.runtime.compile;

import org.codehaus.commons.compiler.CompileException;
import org.codehaus.janino.SimpleCompiler;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelChecks;
import org.phasewright.runtime.symbolic.ModelEvaluationException;
import org.phasewright.runtime.symbolic.ParameterValues;
import org.phasewright.runtime.symbolic.References;
import org.phasewright.runtime.symbolic.SymbolicJacobian;

/** Turns a model into a {@link CompiledModel}: Java source for rates and exact Jacobian, compiled by Janino. */
public final class ModelCompiler {
    /**
     * Above this many states no dense symbolic Jacobian is built (it has n^2 entries): the vector field's
     * {@code jacobian} then throws UnsupportedOperationException (analyses use the sparse Jacobian long before).
     */
    public static final int DENSE_JACOBIAN_LIMIT = 1000;
    /**
     * Indexed models above this many states are meant to be analysed with the sparse Jacobian: their expanded sums
     * make dense symbolic entries large (a sum over the family in every rate gives n^2 entries of n terms). Their
     * dense Jacobian is still built, on first use ({@link LazyJacobianField}), up to {@link #DENSE_JACOBIAN_LIMIT}.
     */
    public static final int INDEXED_DENSE_JACOBIAN_LIMIT = 32;

    /** Throws the UnsupportedOperationException of {@link #DENSE_JACOBIAN_LIMIT} for a model above it. */
    static void requireDenseJacobian(DynamicalModel model) {
        if (model.dimension() > DENSE_JACOBIAN_LIMIT) {
            throw new UnsupportedOperationException("no dense Jacobian for " + model.dimension() + " states");
        }
    }

    private ModelCompiler() {
    }

    /**
     * Generates and compiles the vector field. If the compiler rejects the source (for example a method above the
     * JVM's 64 KB limit for a very large model) the interpreter is used instead and {@link CompiledModel#note()}
     * says why.
     *
     * @throws ModelEvaluationException when parameters, initial values or references cannot be resolved
     */
    public static CompiledModel compile(DynamicalModel model) {
        ModelChecks.check(model);
        double[] parameters = ParameterValues.resolve(model);
        double[] initial = InitialValues.resolve(model, parameters);
        // indexed and large models: rates now, the dense Jacobian when first asked for (LazyJacobianField)
        boolean lazy = model.indexed() || JavaSourceGenerator.large(model, null);
        SymbolicJacobian jacobian = lazy ? null : SymbolicJacobian.of(model);
        String source = new JavaSourceGenerator(model, jacobian).generate();
        Object instance;
        try {
            instance = load(source);
        } catch (CompileException | ReflectiveOperationException | RuntimeException | LinkageError
                | StackOverflowError e) {
            InterpretedVectorField interpreter = new InterpretedVectorField(model, jacobian);
            return new CompiledModel(model, interpreter, interpreter, parameters, initial, autonomous(model),
                    CompiledModel.Backend.INTERPRETER, "generated code could not be compiled (" + brief(e)
                    + "); using the interpreter", null);
        }
        if (lazy) {
            LazyJacobianField field = new LazyJacobianField(model, (VectorField) instance, (DerivedValues) instance);
            return new CompiledModel(model, field, field, parameters, initial, autonomous(model),
                    CompiledModel.Backend.GENERATED_CODE, null, source, () -> lattice(model));
        }
        return new CompiledModel(model, (VectorField) instance, (DerivedValues) instance, parameters, initial,
                autonomous(model), CompiledModel.Backend.GENERATED_CODE, null, source);
    }

    /**
     * The window rates of a lattice model (see {@link LatticeShape}), or null: not a lattice, or the kernel did not
     * compile (then integrators use the whole-state rates, which give the same values).
     */
    static LatticeRates lattice(DynamicalModel model) {
        LatticeShape shape = LatticeShape.of(model);
        if (shape == null) {
            return null;
        }
        try {
            return (LatticeRates) load(new LatticeKernelGenerator(shape).generate(),
                    JavaSourceGenerator.PACKAGE + "." + LatticeKernelGenerator.CLASS_NAME);
        } catch (CompileException | ReflectiveOperationException | RuntimeException | LinkageError
                | StackOverflowError e) {
            return null;
        }
    }

    /** The same model evaluated by walking the expression trees; slower, used as a reference. */
    public static CompiledModel interpret(DynamicalModel model) {
        ModelChecks.check(model);
        double[] parameters = ParameterValues.resolve(model);
        double[] initial = InitialValues.resolve(model, parameters);
        InterpretedVectorField interpreter = new InterpretedVectorField(model);
        return new CompiledModel(model, interpreter, interpreter, parameters, initial, autonomous(model),
                CompiledModel.Backend.INTERPRETER, null, null);
    }

    static Object load(String source) throws CompileException, ReflectiveOperationException {
        return load(source, JavaSourceGenerator.PACKAGE + "." + JavaSourceGenerator.CLASS_NAME);
    }

    /** Compiles generated source with Janino and instantiates {@code className} (no-argument constructor). */
    static Object load(String source, String className) throws CompileException, ReflectiveOperationException {
        SimpleCompiler compiler = new SimpleCompiler();
        compiler.setParentClassLoader(VectorField.class.getClassLoader());
        compiler.cook(source);
        Class<?> type = compiler.getClassLoader().loadClass(className);
        return type.getDeclaredConstructor().newInstance();
    }

    private static String brief(Throwable e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.length() > 200 ? m.substring(0, 200) + "..." : m;
    }

    /** True when no rate depends on time, directly or through derived quantities. */
    static boolean autonomous(DynamicalModel model) {
        if (model.indexed()) { // by family, without expanding every element
            return !ModelLayout.of(model).usesTime();
        }
        boolean[] timed = new boolean[model.derived().size()];
        for (int k = 0; k < timed.length; k++) {
            timed[k] = usesTime(model.derived().get(k).definition(), timed);
        }
        return model.rates().stream().noneMatch(r -> usesTime(r, timed));
    }

    private static boolean usesTime(Expr e, boolean[] timedDerived) {
        for (Variable v : References.of(e)) {
            if (v.kind() == VariableKind.TIME || (v.kind() == VariableKind.DERIVED && timedDerived[v.index()])) {
                return true;
            }
        }
        return false;
    }
}
