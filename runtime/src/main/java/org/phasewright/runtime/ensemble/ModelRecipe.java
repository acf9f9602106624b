package org.phasewright.runtime.ensemble;

import java.io.Serializable;

/**
 * How a worker that has only bytes rebuilds the compiled model of an ensemble: a small serializable description
 * (for instance the model's source text), compiled once per JVM and cached under {@link #key()}.
 */
public interface ModelRecipe extends Serializable {
    /** Equal for recipes that build the same model (e.g. a hash of the source text); used as the cache key. */
    String key();

    /** Parses, lowers and compiles the model; called at most once per JVM and key by a careful caller. */
    org.phasewright.runtime.compile.CompiledModel compile();
}
