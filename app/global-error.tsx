"use client";

// Replaces the whole document when the root layout itself fails, so it carries its own plain styles.
export default function GlobalError({ retry }: { error: unknown; retry: () => void }) {
  return (
    <html lang="en">
      <body
        style={{
          margin: 0,
          minHeight: "100vh",
          background: "#F7F5EF",
          color: "#15191E",
          fontFamily: "system-ui, Arial, sans-serif",
          fontSize: "17px",
          lineHeight: 1.6,
        }}
      >
        <title>Spanlark is having trouble</title>
        <main style={{ maxWidth: "36rem", margin: "0 auto", padding: "2rem 1rem" }}>
          <h1 style={{ fontSize: "1.75rem", margin: "0 0 1rem" }}>Spanlark is having trouble</h1>
          <p>Something went wrong on our side. What you entered in the sizing steps is kept on this phone. Try again in a moment.</p>
          <button
            type="button"
            onClick={() => retry()}
            style={{
              minHeight: "56px",
              padding: "0 1.5rem",
              marginTop: "1rem",
              border: "2px solid #1A5247",
              borderRadius: "0.5rem",
              background: "#1A5247",
              color: "#FFFFFF",
              font: "inherit",
              fontWeight: 700,
              cursor: "pointer",
            }}
          >
            Try again
          </button>
        </main>
      </body>
    </html>
  );
}
