import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * helmet's headers with a Content-Security-Policy the exported Expo web app runs under: scripts only
 * from our origin; inline styles allowed because react-native-web writes its styles into <style> at run
 * time; fonts and images from our origin and data:/blob: (expo-font and generated images).
 * HTTPS-only headers (HSTS, upgrade-insecure-requests) only in production, where TLS is in front.
 */
export function securityHeaders(isProduction: boolean): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        baseUri: ["'self'"],
        connectSrc: ["'self'"],
        fontSrc: ["'self'", 'data:', 'blob:'],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        manifestSrc: ["'self'"],
        mediaSrc: ["'self'", 'data:', 'blob:'],
        objectSrc: ["'none'"],
        scriptSrc: ["'self'"],
        scriptSrcAttr: ["'none'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        workerSrc: ["'self'", 'blob:'],
        upgradeInsecureRequests: isProduction ? [] : null,
      },
    },
    strictTransportSecurity: isProduction,
    crossOriginEmbedderPolicy: false,
    // Same rule as frame-ancestors 'none', for browsers that only read the older header.
    xFrameOptions: { action: 'deny' },
  });
}
