/** Support of {@code congener demo}: the scenario to replay, the embedded runtime, replay, progress and summary. */
package org.congener.cli.demo;
