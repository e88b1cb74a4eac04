/** What a run tells the person at the terminal: the program's version and a run's progress. */
package org.holdfast.console;
