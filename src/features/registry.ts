// Every calculator the app offers, in home-screen order. Screens load lazily so the
// start bundle stays small; each feature folder owns its Screen.tsx.
import type { ComponentType } from 'preact';

/** The situation the user is in: the home screen groups tools by it. */
export type FeatureGroup = 'splice-tray' | 'patch-panel' | 'planning' | 'teaching' | 'library';

export interface FeatureEntry {
  /** Route segment: the screen lives at #/<id>. */
  id: string;
  title: string;
  /** One line on the home screen: the question it answers. */
  summary: string;
  group: FeatureGroup;
  /** Extra words the home filter finds the tool by (trade synonyms), space-separated. */
  keywords?: string;
  load: () => Promise<{ default: ComponentType }>;
}

export const GROUP_TITLES: Record<FeatureGroup, string> = {
  'splice-tray': 'At the splice tray',
  'patch-panel': 'At the patch panel and the trace',
  planning: 'Planning a link',
  teaching: 'Explaining to a class',
  library: 'My fiber types',
};

/** Home-screen order of the groups. */
export const GROUP_ORDER: readonly FeatureGroup[] = ['splice-tray', 'patch-panel', 'planning', 'teaching', 'library'];

export const FEATURES: FeatureEntry[] = [
  { id: 'single-mode', group: 'teaching', title: 'Single-mode check', summary: 'Is this fiber single-mode at this wavelength? V-number and guided LP modes.', load: () => import('./singleMode/Screen') },
  { id: 'mode-field', group: 'teaching', title: 'Mode field diameter', summary: 'MFD at any wavelength: Petermann II, Gaussian fit and Marcuse formula.', load: () => import('./modeField/Screen') },
  { id: 'label-check', group: 'splice-tray', title: 'Check a label', summary: 'From cutoff and MFD on the label to a verdict at the system wavelength.', load: () => import('./labelCheck/Screen') },
  { id: 'joint-loss', group: 'splice-tray', title: 'Joint loss', summary: 'Splice or connector: MFD mismatch, offset, tilt and end gap.', load: () => import('./jointLoss/Screen') },
  { id: 'otdr-splice', group: 'patch-panel', title: 'OTDR splice reading', summary: 'Why one direction shows a gain, and the true splice loss.', load: () => import('./otdrSplice/Screen') },
  { id: 'otdr-setup', group: 'patch-panel', title: 'OTDR set-up and distances', summary: 'Pulse width and resolution, trace ⇄ cable distance, ghosts, and the backscatter level.', keywords: 'otdr pulse resolution dead zone helix group index refractive ghost echo backscatter coefficient gainer', load: () => import('./otdrSetup/Screen') },
  { id: 'bend-or-splice', group: 'patch-panel', title: 'Bend or splice?', summary: 'From an event’s loss at two or three wavelengths: a joint, or a bend, and how tight.', keywords: 'otdr event macrobend 1310 1550 1625 loss wavelength kink', load: () => import('./bendOrSplice/Screen') },
  { id: 'reflection', group: 'patch-panel', title: 'Reflection and return loss', summary: 'Reflectance and return loss side by side, connector faces, air gaps, and the ORL of a link.', keywords: 'reflectance return loss orl fresnel pc upc apc connector polish gel air gap backscatter', load: () => import('./reflection/Screen') },
  { id: 'pmd', group: 'planning', title: 'PMD', summary: 'Polarization mode dispersion of a route, DGD odds, and whether it carries a signal.', keywords: 'pmd dgd polarization mode dispersion maxwell pmdq old fiber 10g 40g 100g', load: () => import('./pmd/Screen') },
  { id: 'bend-loss', group: 'splice-tray', title: 'Bend loss', summary: 'What a tight loop in a tray costs, per turn and for N turns.', load: () => import('./bendLoss/Screen') },
  { id: 'launch', group: 'teaching', title: 'Single-mode ⇄ multimode launch', summary: 'Power coupled into each mode, and the loss each way.', load: () => import('./launch/Screen') },
  { id: 'link-budget', group: 'planning', title: 'Link loss budget', summary: 'Fiber, connectors, splices and splitters against the equipment limits.', load: () => import('./linkBudget/Screen') },
  { id: 'pon-budget', group: 'planning', title: 'PON budget', summary: 'Does this split at this distance fit the loss class, both ways, and is the nearest home too close?', keywords: 'GPON XGS-PON XG-PON splitter class B+ C+ N1 N2 E1 E2 overload FTTH', load: () => import('./ponBudget/Screen') },
  { id: 'wdm-plan', group: 'planning', title: 'WDM channel plan', summary: 'Which grid channel is this laser on, the channel list of a band, and the loss of each CWDM channel.', keywords: 'DWDM CWDM grid THz channel G.694.1 G.694.2 flexible water peak', load: () => import('./wdmPlan/Screen') },
  { id: 'dispersion', group: 'planning', title: 'Chromatic dispersion', summary: 'D(λ), zero-dispersion wavelength, and the reach for a bit rate.', load: () => import('./dispersion/Screen') },
  { id: 'power', group: 'patch-panel', title: 'Optical power', summary: 'dBm ⇄ mW ⇄ µW and power after a chain of losses.', load: () => import('./power/Screen') },
  { id: 'laser-safety', group: 'patch-panel', title: 'Laser safety', summary: 'Cautions and the indicative hazard context for a wavelength and power.', load: () => import('./safety/Screen') },
  { id: 'encircled-flux', group: 'patch-panel', title: 'Launch against the EF template', summary: 'Encircled flux of a multimode launch from its modes: compliant, underfilled or overfilled.', keywords: 'encircled flux EF launch condition template multimode overfilled underfilled modal', load: () => import('./encircledFlux/Screen') },
  { id: 'mode-filter-mandrel', group: 'patch-panel', title: 'Mode-filter mandrel', summary: 'Which mode groups N turns on a mandrel strip, the loss, and what a wrong mandrel does.', keywords: 'mandrel wrap mode filter multimode launch cord', load: () => import('./mandrel/Screen') },
  { id: 'offset-launch', group: 'teaching', title: 'Offset launch into multimode', summary: 'Power per mode group as a single-mode spot moves off the axis; why cords avoid the centre.', keywords: 'offset launch mode conditioning cord patch 1000BASE-LX DMD', load: () => import('./offsetLaunch/Screen') },
  { id: 'link-applications', group: 'planning', title: 'Which Ethernet a link carries', summary: 'Length and loss of a link against the IEEE 802.3 reach and channel loss of each interface.', keywords: 'ethernet 10GBASE-SR 1000BASE-SX 100GBASE application reach channel insertion loss IEEE 802.3', load: () => import('./linkApplications/Screen') },
  { id: 'library', group: 'library', title: 'Fiber types', summary: 'Save, edit, back up and restore the fiber types you meet.', load: () => import('./library/Screen') },
];

export function findFeature(id: string): FeatureEntry | undefined {
  return FEATURES.find((f) => f.id === id);
}
