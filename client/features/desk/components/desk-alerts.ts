import { useCallback, useState } from 'react';

const KEY = 'shoalwise.deskAlerts';
interface AlertPrefs {
  sound: boolean;
  desktop: boolean;
}

function load(): AlertPrefs {
  try {
    return {
      sound: false,
      desktop: false,
      ...(JSON.parse(localStorage.getItem(KEY) ?? '{}') as Partial<AlertPrefs>),
    };
  } catch {
    return { sound: false, desktop: false };
  }
}

/** A short two-note chime made on the spot: no sound file to ship or fetch. */
function chime(): void {
  const AudioCtx =
    window.AudioContext ??
    (window as unknown as { webkitAudioContext?: typeof AudioContext }).webkitAudioContext;
  if (!AudioCtx) return;
  const ctx = new AudioCtx();
  [660, 880].forEach((freq, i) => {
    const osc = ctx.createOscillator();
    const gain = ctx.createGain();
    osc.frequency.value = freq;
    gain.gain.setValueAtTime(0.0001, ctx.currentTime + i * 0.18);
    gain.gain.exponentialRampToValueAtTime(0.15, ctx.currentTime + i * 0.18 + 0.02);
    gain.gain.exponentialRampToValueAtTime(0.0001, ctx.currentTime + i * 0.18 + 0.16);
    osc.connect(gain).connect(ctx.destination);
    osc.start(ctx.currentTime + i * 0.18);
    osc.stop(ctx.currentTime + i * 0.18 + 0.2);
  });
  setTimeout(() => void ctx.close(), 800);
}

/** The mentor's opt-in sound and desktop notice for urgent concerns; off until they turn it on. */
export function useDeskAlerts() {
  const [prefs, setPrefs] = useState(load);
  const save = (next: AlertPrefs) => {
    localStorage.setItem(KEY, JSON.stringify(next));
    setPrefs(next);
  };
  const setSound = (on: boolean) => save({ ...prefs, sound: on });
  const setDesktop = async (on: boolean) => {
    if (on && 'Notification' in window && Notification.permission !== 'granted') {
      const answer = await Notification.requestPermission();
      if (answer !== 'granted') return save({ ...prefs, desktop: false });
    }
    save({ ...prefs, desktop: on && 'Notification' in window });
  };
  const alert = useCallback(
    (title: string, body: string) => {
      if (prefs.sound) chime();
      if (
        prefs.desktop &&
        'Notification' in window &&
        Notification.permission === 'granted' &&
        document.visibilityState !== 'visible'
      ) {
        new Notification(title, { body, tag: 'shoalwise-desk' });
      }
    },
    [prefs],
  );
  return {
    prefs,
    setSound,
    setDesktop,
    alert,
    desktopSupported: typeof window !== 'undefined' && 'Notification' in window,
  };
}
