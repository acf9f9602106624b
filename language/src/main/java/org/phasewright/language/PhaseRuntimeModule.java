/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language;


/**
 * Use this class to register components to be used at runtime / without the Equinox extension registry.
 */
public class PhaseRuntimeModule extends AbstractPhaseRuntimeModule {
}
