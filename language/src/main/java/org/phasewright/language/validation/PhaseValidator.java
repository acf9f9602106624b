/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language.validation;


/**
 * This class contains custom validation rules. 
 *
 * See https://www.eclipse.org/Xtext/documentation/303_runtime_concepts.html#validation
 */
public class PhaseValidator extends AbstractPhaseValidator {
	
//	public static final String INVALID_NAME = "invalidName";
//
//	@Check
//	public void checkGreetingStartsWithCapital(Greeting greeting) {
//		if (!Character.isUpperCase(greeting.getName().charAt(0))) {
//			warning("Name should start with a capital",
//					PhasePackage.Literals.GREETING__NAME,
//					INVALID_NAME);
//		}
//	}
	
}
