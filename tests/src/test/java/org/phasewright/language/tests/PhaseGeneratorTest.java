package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.generator.GeneratorContext;
import org.eclipse.xtext.generator.InMemoryFileSystemAccess;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.generator.PhaseGenerator;
import org.phasewright.language.phase.PhaseModel;

import com.google.inject.Inject;
import com.google.inject.Provider;

/** On save, the generator runs the model's studies and writes the results beside the model file. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class PhaseGeneratorTest {

    @Inject
    private ParseHelper<PhaseModel> parser;
    @Inject
    private Provider<XtextResourceSet> resourceSets;
    @Inject
    private PhaseGenerator generator;

    @TempDir
    Path folder;

    @Test
    void savingAModelWritesItsStudyResultsBesideIt() throws Exception {
        Path file = folder.resolve("decay.phase");
        PhaseModel model = parser.parse("model decay\nparam k = 2\nstate x = 1\nrate x = -k*x\n"
                + "study quick { simulate to t = 1\n equilibria }\n",
                URI.createFileURI(file.toString()), resourceSets.get());
        generator.doGenerate(model.eResource(), new InMemoryFileSystemAccess(), new GeneratorContext());
        Path results = folder.resolve("decay.results/quick");
        assertTrue(Files.isRegularFile(results.resolve("trajectory.csv")));
        String json = Files.readString(results.resolve("equilibria.json"));
        // x' = -k x has the single equilibrium x = 0 with eigenvalue -k (closed form).
        assertTrue(json.contains("\"coordinates\": [0.0]"), json);
        assertTrue(json.contains("stable node"), json);
    }

    @Test
    void modelsThatAreNotFilesAreLeftAlone() throws Exception {
        PhaseModel model = parser.parse("model m\nstate x = 1\nrate x = -x\nstudy s { equilibria }\n");
        generator.doGenerate(model.eResource(), new InMemoryFileSystemAccess(), new GeneratorContext());
        try (var entries = Files.list(folder)) {
            assertFalse(entries.findAny().isPresent());
        }
    }
}
