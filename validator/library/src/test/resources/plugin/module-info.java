module org.example.sitechecks {
    requires org.protolyte.library;
    exports org.example.sitechecks;
    provides org.protolyte.spi.CheckKind with org.example.sitechecks.PhUncertaintyLimit;
    provides org.protolyte.spi.SubstanceLibrarySource with org.example.sitechecks.SiteSubstances;
}
