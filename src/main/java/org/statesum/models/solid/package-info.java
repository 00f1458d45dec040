/**
 * Solids: harmonic crystals (Einstein, Debye, phonons on a q-point mesh, a phonon density of states) and
 * the quasi-harmonic approximation over sampled volumes, in SI per formula unit or per atom. Each model
 * also offers G(T) per formula unit for reactions and phase crossings ({@code CrystalModel.gibbsEnergy},
 * G = F at zero pressure; {@code QuasiHarmonicModel.gibbsEnergy}, G(T, P) at one pressure).
 *
 * <p>References: A. Einstein, Ann. Phys. 22 (1907) 180; P. Debye, Ann. Phys. 39 (1912) 789;
 * E. Grueneisen, Ann. Phys. 344 (1912) 257; A. A. Maradudin, E. W. Montroll, G. H. Weiss, I. P. Ipatova,
 * Theory of Lattice Dynamics in the Harmonic Approximation, 2nd ed. (Academic Press, 1971); M. T. Dove,
 * Introduction to Lattice Dynamics (Cambridge, 1993), ch. 4 (quasi-harmonic thermodynamics); C. Kittel,
 * Introduction to Solid State Physics, 8th ed. (Wiley, 2005), ch. 5; L. F. Richardson, Phil. Trans. R. Soc.
 * A 210 (1911) 307 (the extrapolation behind the density-of-states quadrature estimate).
 */
package org.statesum.models.solid;
