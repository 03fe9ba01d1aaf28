/**
 * The service provider interface: what a site implements to add its own {@link org.protolyte.spi.CheckKind check
 * kinds} and {@link org.protolyte.spi.SubstanceLibrarySource substance libraries}, in a jar of its own. Nothing here
 * hands out the engine's internals: a check reads a copy of the results ({@link org.protolyte.spi.Analysis}) and
 * answers with {@link org.protolyte.spi.Violation violations}; its pack supplies the severity and the words.
 *
 * <p>A jar declares its providers in {@code META-INF/services/org.protolyte.spi.CheckKind} (class path, or the command
 * line's {@code --plugins DIR}) or with {@code provides org.protolyte.spi.CheckKind with ...} in its module descriptor
 * (module path). Reports list every jar a run loaded, with its SHA-256.
 */
package org.protolyte.spi;
