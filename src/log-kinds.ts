import type { LogKind } from '../server/schemas/log';

// How each kind of work looks in the client; the words come from server/schemas/log.ts.
export const logKindIcons: Record<LogKind, string> = {
  prune: 'pi pi-wrench', feed: 'pi pi-box', mulch: 'pi pi-th-large', thin: 'pi pi-sliders-h', pinch: 'pi pi-thumbtack',
  'leaf-pick': 'pi pi-bookmark', harvest: 'pi pi-shopping-bag', spray: 'pi pi-cloud', water: 'pi pi-filter', note: 'pi pi-pencil',
};

/** Photos over this size are made smaller on the phone before they leave it: quicker on a weak signal. */
export const shrinkAboveBytes = 1_500_000;
/** 2048 px on the longer side still shows a canker or a silvered leaf clearly. */
export const shrinkToEdge = 2048;
