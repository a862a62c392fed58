/**
 * Matrix factorisation for implicit feedback: ALS after Hu, Koren &amp; Volinsky 2008 with a Cholesky
 * and a conjugate-gradient solver, the single-user fold-in, and BPR after Rendle et al. 2009.
 */
package org.congener.core.factorisation;
