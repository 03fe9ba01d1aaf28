/**
 * The Protolyte library: the engine and the validator. Its API is {@code org.protolyte.api}, and what a site implements
 * to add its own check kinds and substance libraries is {@code org.protolyte.spi}; every other package is internal,
 * open only to the project's own command line.
 */
module org.protolyte.library {
    requires tools.jackson.databind;
    requires com.networknt.schema;
    requires commons.math3;

    exports org.protolyte.api;
    exports org.protolyte.spi;

    exports org.protolyte to org.protolyte.cli;
    exports org.protolyte.analysis to org.protolyte.cli;
    exports org.protolyte.batch to org.protolyte.cli;
    exports org.protolyte.chemistry to org.protolyte.cli;
    exports org.protolyte.document to org.protolyte.cli;
    exports org.protolyte.plugin to org.protolyte.cli;
    exports org.protolyte.recipe to org.protolyte.cli;
    exports org.protolyte.report to org.protolyte.cli;
    exports org.protolyte.report.plot to org.protolyte.cli;
    exports org.protolyte.rules to org.protolyte.cli;
    exports org.protolyte.substance to org.protolyte.cli;
    exports org.protolyte.text to org.protolyte.cli;
    exports org.protolyte.units to org.protolyte.cli;

    uses org.protolyte.spi.CheckKind;
    uses org.protolyte.spi.SubstanceLibrarySource;
    uses org.protolyte.rules.CheckKind;
    provides org.protolyte.rules.CheckKind with
            org.protolyte.rules.PhWithinTarget,
            org.protolyte.rules.PhTargetTemperatureStated,
            org.protolyte.rules.PhWithinLimits,
            org.protolyte.rules.PkaNearTarget,
            org.protolyte.rules.BufferCapacityRange,
            org.protolyte.rules.IonicStrengthLimit,
            org.protolyte.rules.TitrantReachesGoal,
            org.protolyte.rules.TitrantPlausible,
            org.protolyte.rules.FormStated,
            org.protolyte.rules.ConcentrationLimit,
            org.protolyte.rules.AmountPerDose,
            org.protolyte.rules.OsmolarityLimit,
            org.protolyte.rules.HazardNotes,
            org.protolyte.rules.LightSensitive,
            org.protolyte.rules.RevisionStated,
            org.protolyte.rules.TemperatureDrift,
            org.protolyte.rules.BicarbonateNeedsCo2,
            org.protolyte.rules.AirExposureDrift,
            org.protolyte.rules.LoadCapacity,
            org.protolyte.rules.TitratableAcidityLimit,
            org.protolyte.rules.BatchRisk,
            org.protolyte.rules.OsmolalityRange,
            org.protolyte.rules.FrozenBuffer,
            org.protolyte.rules.SaturationIndex,
            org.protolyte.rules.DrugSolubilityMargin,
            org.protolyte.rules.SolubilityLimit,
            org.protolyte.rules.BatchAdditionsMatch,
            org.protolyte.rules.BatchAmountTolerance,
            org.protolyte.rules.BatchMeasurementAgrees.Ph,
            org.protolyte.rules.BatchMeasurementAgrees.Titrant,
            org.protolyte.rules.BatchMeasurementAgrees.Osmolality,
            org.protolyte.rules.BatchDiagnosis,
            org.protolyte.rules.BatchOutOfSpecification;
}
