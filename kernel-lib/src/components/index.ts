// Public exports of components/ (filled by the area as it lands).
export {};
