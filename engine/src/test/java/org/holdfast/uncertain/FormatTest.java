package org.holdfast.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class FormatTest {

    @Test
    void trailingZerosGoButSignificantOnesStay() {
        assertEquals("770", Format.number(770));
        assertEquals("100000", Format.number(1e5));
        assertEquals("1.5e+12", Format.number(1.5e12));
        assertEquals("1e+12", Format.number(1e12));
        assertEquals("0.2", Format.number(0.2));
        assertEquals("-0.013", Format.number(-0.013));
        assertEquals("0", Format.number(0));
        assertEquals("8.122", Format.number(8.122));
    }
}
