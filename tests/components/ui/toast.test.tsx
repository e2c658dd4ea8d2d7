// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, test, vi } from "vitest";
import { Button } from "@/components/ui/button";
import { ToastProvider, useToast } from "@/components/ui/toast";

afterEach(() => {
  cleanup();
  vi.useRealTimers();
});

function DeleteMember({ onUndo }: { onUndo: () => void }) {
  const toast = useToast();
  return <Button onClick={() => toast.show({ message: "Member deleted", undo: onUndo, durationMs: 5000 })}>Delete</Button>;
}

describe("Toast", () => {
  test("Undo calls back once and the note goes", async () => {
    const onUndo = vi.fn();
    render(
      <ToastProvider>
        <DeleteMember onUndo={onUndo} />
      </ToastProvider>,
    );
    fireEvent.click(screen.getByRole("button", { name: "Delete" }));
    expect(screen.getByText("Member deleted")).toBeTruthy();
    await act(async () => {
      fireEvent.click(screen.getByRole("button", { name: "Undo" }));
    });
    expect(onUndo).toHaveBeenCalledTimes(1);
    expect(screen.queryByText("Member deleted")).toBeNull();
  });

  test("goes by itself after its time", () => {
    vi.useFakeTimers();
    render(
      <ToastProvider>
        <DeleteMember onUndo={() => undefined} />
      </ToastProvider>,
    );
    fireEvent.click(screen.getByRole("button", { name: "Delete" }));
    act(() => {
      vi.advanceTimersByTime(4999);
    });
    expect(screen.getByText("Member deleted")).toBeTruthy();
    act(() => {
      vi.advanceTimersByTime(2);
    });
    expect(screen.queryByText("Member deleted")).toBeNull();
  });

  test("useToast outside the provider says so", () => {
    function Lonely() {
      useToast();
      return null;
    }
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    expect(() => render(<Lonely />)).toThrow(/ToastProvider/);
    spy.mockRestore();
  });
});
