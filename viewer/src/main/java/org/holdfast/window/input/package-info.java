/**
 * Keys and the mouse turned into changes of the {@link org.holdfast.window.ViewState}: a table of
 * key bindings ({@link org.holdfast.window.input.Bindings}) and the controls that apply them
 * ({@link org.holdfast.window.Controls}). Nothing here needs a window, so every binding is
 * unit-tested with plain events.
 */
package org.holdfast.window.input;
