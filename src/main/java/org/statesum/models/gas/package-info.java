/**
 * One molecular species as an ideal gas: the molecular partition function factorised into
 * translation, rotation, vibration and electronic levels, each giving its part of U, S and C_V, with
 * the pV term carried by translation.
 *
 * <p>References: translation, the Sackur-Tetrode equation with the thermal de Broglie wavelength
 * (D. A. McQuarrie, Statistical Mechanics, 1976, ch. 5); rotation and vibration, the rigid rotor and
 * harmonic oscillator (McQuarrie ch. 6 and 8; G. Herzberg, Molecular Spectra and Molecular Structure
 * I and II, 1945-1950), nuclear-spin statistics of homonuclear molecules and the ortho/para
 * modifications (McQuarrie ch. 6-5); low-frequency modes: S. Grimme, "Supramolecular binding
 * thermodynamics by dispersion-corrected density functional theory", Chem. Eur. J. 18 (2012) 9955
 * (entropy interpolation to a free rotor, omega_0 = 100 cm^-1, alpha = 4, B_av = 1e-44 kg m^2);
 * Y.-P. Li, J. Gomes, S. M. Sharada, A. T. Bell, M. Head-Gordon, "Improved force-field parameters for
 * QM/MM simulations of the energies of adsorption for molecules in zeolites and a free rotor correction
 * to the rigid rotor harmonic oscillator model for adsorption enthalpies", J. Phys. Chem. C 119 (2015)
 * 1840 (the same interpolation for the energy); R. F. Ribeiro, A. V. Marenich, C. J. Cramer,
 * D. G. Truhlar, J. Phys. Chem. B 115 (2011) 14556 (raising wavenumbers below 100 cm^-1 to 100 cm^-1).
 */
package org.statesum.models.gas;
