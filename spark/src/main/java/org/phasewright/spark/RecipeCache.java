package org.phasewright.spark;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.ModelRecipe;

/**
 * Compiled models of this JVM by recipe key: an executor parses, lowers and compiles a model once, however many
 * tasks of however many ensembles it runs.
 */
final class RecipeCache {
    private static final Map<String, CompiledModel> MODELS = new ConcurrentHashMap<>();

    private RecipeCache() {
    }

    static CompiledModel model(ModelRecipe recipe) {
        return model(recipe.key(), recipe);
    }

    /** The model of {@code recipe}, whose key is {@code key}. */
    static CompiledModel model(String key, ModelRecipe recipe) {
        return MODELS.computeIfAbsent(key, k -> recipe.compile());
    }
}
