/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language.ide;


/**
 * Use this class to register ide components.
 */
public class PhaseIdeModule extends AbstractPhaseIdeModule {
}
