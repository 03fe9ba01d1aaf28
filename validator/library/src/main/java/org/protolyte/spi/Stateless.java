package org.protolyte.spi;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Declares that a {@link CheckKind} keeps nothing between calls: the same instance judges every document, from many
 * threads at once. The loader refuses a kind without it, and one with an instance field that is not final.
 */
@Documented
@Retention(RetentionPolicy.RUNTIME)
@Target(ElementType.TYPE)
public @interface Stateless {
}
