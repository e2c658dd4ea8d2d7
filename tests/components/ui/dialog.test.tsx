// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, test, vi } from "vitest";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";

afterEach(cleanup);

describe("Dialog", () => {
  test("open: named by its title, described, with its actions; the close button and Escape call onClose", () => {
    const onClose = vi.fn();
    render(
      <Dialog open onClose={onClose} title="Delete this member?" description="2-ply 2x10 header, kitchen opening." actions={<Button>Delete</Button>}>
        <p>You can undo for a few seconds after.</p>
      </Dialog>,
    );
    const dialog = screen.getByRole("dialog", { name: "Delete this member?" });
    expect(dialog.hasAttribute("open")).toBe(true);
    const description = document.getElementById(dialog.getAttribute("aria-describedby") ?? "");
    expect(description?.textContent).toBe("2-ply 2x10 header, kitchen opening.");
    fireEvent.click(screen.getByRole("button", { name: "Close" }));
    fireEvent(dialog, new Event("cancel", { cancelable: true }));
    expect(onClose).toHaveBeenCalledTimes(2);
  });

  test("closed: not shown", () => {
    render(<Dialog open={false} onClose={() => undefined} title="Rename job" />);
    expect(screen.queryByRole("dialog")).toBeNull();
  });
});
