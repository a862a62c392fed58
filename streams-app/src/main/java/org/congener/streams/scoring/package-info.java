/** How suggestion candidates are scored and filtered; the scorer is an interface so it can be swapped. */
package org.congener.streams.scoring;
