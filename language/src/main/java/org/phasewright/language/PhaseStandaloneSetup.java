/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language;


/**
 * Initialization support for running Xtext languages without Equinox extension registry.
 */
public class PhaseStandaloneSetup extends PhaseStandaloneSetupGenerated {

	public static void doSetup() {
		new PhaseStandaloneSetup().createInjectorAndDoEMFRegistration();
	}
}
