/** Which screen is shown: kept in the address hash (#/workspace) so reload keeps the place. */
export const SCREENS = [
  { id: 'register', title: 'Register', key: '1' },
  { id: 'workspace', title: 'Workspace', key: '2' },
  { id: 'eyewear', title: 'Eyewear', key: '3' },
  { id: 'controls', title: 'Controls', key: '4' },
  { id: 'review', title: 'Review & sign', key: '5' },
  { id: 'documents', title: 'Print & export', key: '6' },
  { id: 'checks', title: 'Limit table checks', key: '7' },
] as const;
export type ScreenId = (typeof SCREENS)[number]['id'];

function fromHash(): ScreenId {
  const h = window.location.hash.replace(/^#\/?/, '').split('?')[0] ?? '';
  return (SCREENS.find((s) => s.id === h)?.id ?? 'register') as ScreenId;
}

class Router {
  screen = $state<ScreenId>(fromHash());
  constructor() {
    window.addEventListener('hashchange', () => {
      this.screen = fromHash();
    });
  }
  go(id: ScreenId): void {
    this.screen = id;
    const target = `#/${id}`;
    if (window.location.hash !== target) window.history.replaceState(null, '', target);
  }
}

export const router = new Router();
