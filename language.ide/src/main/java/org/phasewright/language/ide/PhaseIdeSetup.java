/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language.ide;

import com.google.inject.Guice;
import com.google.inject.Injector;
import org.eclipse.xtext.util.Modules2;
import org.phasewright.language.PhaseRuntimeModule;
import org.phasewright.language.PhaseStandaloneSetup;

/**
 * Initialization support for running Xtext languages as language servers.
 */
public class PhaseIdeSetup extends PhaseStandaloneSetup {

	@Override
	public Injector createInjector() {
		return Guice.createInjector(Modules2.mixin(new PhaseRuntimeModule(), new PhaseIdeModule()));
	}
	
}
