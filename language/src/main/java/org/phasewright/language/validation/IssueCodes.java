package org.phasewright.language.validation;

/** Stable identifiers of validation issues, used by quick fixes and tests. */
public final class IssueCodes {
    private IssueCodes() {
    }

    private static final String PREFIX = "org.phasewright.language.";

    public static final String DUPLICATE_NAME = PREFIX + "duplicateName";
    public static final String DUPLICATE_TIME = PREFIX + "duplicateTime";
    public static final String STUDY_NAME_TOO_LONG = PREFIX + "studyNameTooLong";
    public static final String NO_STATES = PREFIX + "noStates";
    public static final String MISSING_RATE = PREFIX + "missingRate";
    public static final String DUPLICATE_RATE = PREFIX + "duplicateRate";
    public static final String RATE_OF_NON_STATE = PREFIX + "rateOfNonState";
    public static final String LET_CYCLE = PREFIX + "letCycle";
    public static final String PARAM_CYCLE = PREFIX + "paramCycle";
    public static final String UNKNOWN_FUNCTION = PREFIX + "unknownFunction";
    public static final String WRONG_ARITY = PREFIX + "wrongArity";
    public static final String NOT_CONSTANT = PREFIX + "notConstant";
    public static final String OUT_OF_RANGE = PREFIX + "outOfRange";
    public static final String EMPTY_RANGE = PREFIX + "emptyRange";
    public static final String UNUSED_PARAM = PREFIX + "unusedParam";
    public static final String WRONG_TIME_NAME = PREFIX + "wrongTimeName";
    public static final String WRONG_START_SIZE = PREFIX + "wrongStartSize";
    public static final String BAD_END_TIME = PREFIX + "badEndTime";
    public static final String BAD_TOLERANCE = PREFIX + "badTolerance";
    public static final String EMPTY_STUDY = PREFIX + "emptyStudy";
    public static final String SYMMETRY_OF_NON_STATE = PREFIX + "symmetryOfNonState";
    public static final String SYMMETRY_REPEATS_STATE = PREFIX + "symmetryRepeatsState";
    public static final String NOT_A_NUMBER = PREFIX + "notANumber";
    // Units and dimensions (UnitChecks).
    public static final String UNKNOWN_UNIT = PREFIX + "unknownUnit";
    public static final String UNLIKE_DIMENSIONS = PREFIX + "unlikeDimensions";
    public static final String DIMENSIONED_ARGUMENT = PREFIX + "dimensionedArgument";
    public static final String BAD_EXPONENT = PREFIX + "badExponent";
    public static final String WRONG_RATE_DIMENSION = PREFIX + "wrongRateDimension";
    public static final String WRONG_VALUE_DIMENSION = PREFIX + "wrongValueDimension";
    public static final String WRONG_RANGE_DIMENSION = PREFIX + "wrongRangeDimension";
    // Symmetries (SymmetryChecks). SYMMETRY_DISCOVERED carries the declaration text to insert as issue data.
    public static final String NONLINEAR_SYMMETRY = PREFIX + "nonlinearSymmetry";
    public static final String SINGULAR_SYMMETRY = PREFIX + "singularSymmetry";
    public static final String BROKEN_SYMMETRY = PREFIX + "brokenSymmetry";
    public static final String SYMMETRY_VERIFIED = PREFIX + "symmetryVerified";
    public static final String SYMMETRY_UNVERIFIED = PREFIX + "symmetryUnverified";
    public static final String SYMMETRY_DISCOVERED = PREFIX + "symmetryDiscovered";
    // Indexed families (IndexChecks, StudyChecks).
    public static final String INDEX_KIND_MISSING = PREFIX + "indexKindMissing";
    public static final String BAD_INDEX_BOUND = PREFIX + "badIndexBound";
    public static final String EMPTY_INDEX = PREFIX + "emptyIndex";
    public static final String INDEX_TOO_LARGE = PREFIX + "indexTooLarge";
    public static final String FAMILY_WITHOUT_INDEX = PREFIX + "familyWithoutIndex";
    public static final String SCALAR_WITH_INDEX = PREFIX + "scalarWithIndex";
    public static final String INDEX_NOT_BOUND = PREFIX + "indexNotBound";
    public static final String BAD_INDEX_EXPRESSION = PREFIX + "badIndexExpression";
    public static final String SUM_REBINDS_INDEX = PREFIX + "sumRebindsIndex";
    public static final String RATE_INDEX_MISMATCH = PREFIX + "rateIndexMismatch";
    public static final String MAP_INDEX_MISMATCH = PREFIX + "mapIndexMismatch";
    public static final String TABLE_SIZE_MISMATCH = PREFIX + "tableSizeMismatch";
    public static final String LISTED_WITHOUT_INDEX = PREFIX + "listedWithoutIndex";
    public static final String TABLE_WITH_RANGE = PREFIX + "tableWithRange";
    public static final String BAD_LEADING = PREFIX + "badLeading";
    public static final String GRID_VARIABLE = PREFIX + "gridVariable";
    public static final String BAD_GRID_STEPS = PREFIX + "badGridSteps";
    // Info: a declared symmetry of a large indexed model is not checked element by element.
    public static final String SYMMETRY_NOT_CHECKED = PREFIX + "symmetryNotChecked";
}
