package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class NumbersTest {

    @Test
    void hugeNumbersKeepTheirExponentInsteadOfHundredsOfDigits() {
        assertEquals("1E+300", Numbers.significant(1e300, 4).toString());
        assertEquals("1E+300", Numbers.decimals(1e300, 2).toString());
    }

    @Test
    void ordinaryNumbersStayPlain() {
        assertEquals("10", Numbers.significant(10, 4).toString());
        assertEquals("1234.5", Numbers.decimals(1234.5, 1).toString());
        assertEquals("7.4", Numbers.decimals(7.4049, 2).toString().substring(0, 3));
    }
}
